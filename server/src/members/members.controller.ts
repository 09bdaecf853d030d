import { Body, Controller, Param, ParseUUIDPipe, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentPrincipal, MinRole, type Principal } from '../auth/principal.js';
import type { MemberDto } from '../clubs/dto/club.dto.js';
import { MemberRolesService } from './member-roles.service.js';
import { MemberRoleDto } from './dto/member-role.dto.js';

@ApiTags('members')
@ApiBearerAuth()
@Controller('members')
export class MembersController {
  constructor(private readonly roles: MemberRolesService) {}

  @Patch(':membershipId')
  @MinRole('admin')
  changeRole(@CurrentPrincipal() p: Principal, @Param('membershipId', ParseUUIDPipe) id: string, @Body() dto: MemberRoleDto): Promise<MemberDto> {
    return this.roles.change(p, id, dto.role);
  }
}
