import { type Role } from '@breakline/sync-protocol';
export declare class MemberRoleDto {
    role: Role;
}
