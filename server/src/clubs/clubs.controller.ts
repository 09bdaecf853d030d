import { Body, Controller, Get, Param, ParseUUIDPipe, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentPrincipal, MinRole, type Principal } from '../auth/principal.js';
import { ClubsService } from './clubs.service.js';
import type { ClubDto, MemberDto } from './dto/club.dto.js';
import { ClubSettingsDto } from './dto/club-settings.dto.js';

@ApiTags('clubs')
@ApiBearerAuth()
@Controller()
export class ClubsController {
  constructor(private readonly clubs: ClubsService) {}

  @Get('clubs/current')
  current(@CurrentPrincipal() p: Principal): Promise<ClubDto> {
    return this.clubs.get(p, p.clubId);
  }

  /** Admins change the club's settings; phones pick them up with their next session refresh. */
  @Patch('clubs/current')
  @MinRole('admin')
  update(@CurrentPrincipal() p: Principal, @Body() body: ClubSettingsDto): Promise<ClubDto> {
    return this.clubs.update(p, body);
  }

  @Get('clubs/:id')
  one(@CurrentPrincipal() p: Principal, @Param('id', ParseUUIDPipe) id: string): Promise<ClubDto> {
    return this.clubs.get(p, id);
  }

  @Get('members')
  @MinRole('supervisor')
  members(@CurrentPrincipal() p: Principal): Promise<MemberDto[]> {
    return this.clubs.members(p);
  }
}
