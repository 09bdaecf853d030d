import { Repository } from 'typeorm';
import { Membership } from './membership.entity.js';
export declare class MembershipsService {
    private readonly repo;
    constructor(repo: Repository<Membership>);
    findById(id: string): Promise<Membership | null>;
    /** A person's memberships with their clubs, oldest first (the default club is the first). */
    forUser(userId: string): Promise<Membership[]>;
    /** Members of one club: always filtered by the caller's club id. */
    inClub(clubId: string): Promise<Membership[]>;
}
