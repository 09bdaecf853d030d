import { Controller, Get, Param, ParseUUIDPipe } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentPrincipal, MinRole, type Principal } from '../auth/principal.js';
import { ClubsService } from './clubs.service.js';
import type { ClubDto, MemberDto } from './dto/club.dto.js';

@ApiTags('clubs')
@ApiBearerAuth()
@Controller()
export class ClubsController {
  constructor(private readonly clubs: ClubsService) {}

  @Get('clubs/current')
  current(@CurrentPrincipal() p: Principal): Promise<ClubDto> {
    return this.clubs.get(p, p.clubId);
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
