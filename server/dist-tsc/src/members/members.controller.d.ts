import { type Principal } from '../auth/principal.js';
import type { MemberDto } from '../clubs/dto/club.dto.js';
import { MemberRolesService } from './member-roles.service.js';
import { MemberRoleDto } from './dto/member-role.dto.js';
export declare class MembersController {
    private readonly roles;
    constructor(roles: MemberRolesService);
    changeRole(p: Principal, id: string, dto: MemberRoleDto): Promise<MemberDto>;
}
