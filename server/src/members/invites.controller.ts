import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentPrincipal, MinRole, Public, type Principal } from '../auth/principal.js';
import type { SessionDto } from '../auth/dto/session.dto.js';
import { InvitesService } from './invites.service.js';
import { AcceptInviteDto, CreateInviteDto, type InviteDto } from './dto/invite.dto.js';

@ApiTags('invites')
@Controller('invites')
export class InvitesController {
  constructor(private readonly invites: InvitesService) {}

  @ApiBearerAuth()
  @Post()
  @MinRole('admin')
  create(@CurrentPrincipal() p: Principal, @Body() dto: CreateInviteDto): Promise<InviteDto> {
    return this.invites.create(p, dto);
  }

  @ApiBearerAuth()
  @Get()
  @MinRole('admin')
  list(@CurrentPrincipal() p: Principal): Promise<InviteDto[]> {
    return this.invites.list(p);
  }

  @ApiBearerAuth()
  @Delete(':id')
  @HttpCode(204)
  @MinRole('admin')
  async withdraw(@CurrentPrincipal() p: Principal, @Param('id', ParseUUIDPipe) id: string): Promise<void> {
    await this.invites.withdraw(p, id);
  }

  /** Accepting needs no sign-in: the link's token is the proof. Answers like a sign-in. */
  @Public()
  @Post('accept')
  @HttpCode(200)
  accept(@Body() dto: AcceptInviteDto): Promise<SessionDto> {
    return this.invites.accept(dto);
  }
}
