import { type Principal } from '../auth/principal.js';
import { ClubsService } from './clubs.service.js';
import type { ClubDto, MemberDto } from './dto/club.dto.js';
export declare class ClubsController {
    private readonly clubs;
    constructor(clubs: ClubsService);
    current(p: Principal): Promise<ClubDto>;
    one(p: Principal, id: string): Promise<ClubDto>;
    members(p: Principal): Promise<MemberDto[]>;
}
