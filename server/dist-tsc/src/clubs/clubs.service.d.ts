import { Repository } from 'typeorm';
import type { Principal } from '../auth/principal.js';
import { Club } from './club.entity.js';
import { MembershipsService } from './memberships.service.js';
import type { ClubDto, MemberDto } from './dto/club.dto.js';
export declare class ClubsService {
    private readonly clubs;
    private readonly memberships;
    constructor(clubs: Repository<Club>, memberships: MembershipsService);
    /** A club's settings, only for the caller's own active club. */
    get(p: Principal, clubId: string): Promise<ClubDto>;
    members(p: Principal): Promise<MemberDto[]>;
}
export declare function toClubDto(c: Club): ClubDto;
