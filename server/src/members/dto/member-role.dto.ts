import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { ROLES, type Role } from '@breakline/sync-protocol';

export class MemberRoleDto {
  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}.` })
  role: Role;
}
