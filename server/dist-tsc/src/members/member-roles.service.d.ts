import { DataSource } from 'typeorm';
import type { Role } from '@breakline/sync-protocol';
import type { Principal } from '../auth/principal.js';
import type { MemberDto } from '../clubs/dto/club.dto.js';
/** Roles per club, changed by an admin; a club always keeps at least one admin. */
export declare class MemberRolesService {
    private readonly db;
    constructor(db: DataSource);
    change(p: Principal, membershipId: string, role: Role): Promise<MemberDto>;
}
