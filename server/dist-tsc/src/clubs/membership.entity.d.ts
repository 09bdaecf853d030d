import type { Role } from '@breakline/sync-protocol';
import { Club } from './club.entity.js';
import { User } from '../users/user.entity.js';
/** A person's role in one club. The active club of a request always comes from here. */
export declare class Membership {
    id: string;
    clubId: string;
    userId: string;
    role: Role;
    club?: Club;
    user?: User;
    createdAt: Date;
}
