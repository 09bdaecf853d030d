import { DataSource } from 'typeorm';
import { type MemberAward } from '@breakline/sync-protocol';
import { PushService } from '../sync/push.service.js';
/** The server's own device for member cards; its seq counts on from what the club has accepted. */
export declare const MEMBER_CARDS_DEVICE = "member-cards";
export interface MemberCardOptions {
    /** Awards for a card made now; an existing card keeps its awards (a supervisor keeps them). */
    awards?: MemberAward[];
    /** Who the change is recorded as made by; the member themselves when not given. */
    byUserId?: string;
}
export type MemberCardResult = {
    recordId: string;
    status: 'created' | 'updated' | 'unchanged';
};
/**
 * Member cards: the synced record (kind `member`) every phone of the club reads for names and
 * awards. Written through the same push rules as a phone's change, so it reaches phones by the
 * ordinary pull, and a second call for the same membership changes nothing.
 */
export declare class MemberCardsService {
    private readonly db;
    private readonly pushes;
    constructor(db: DataSource, pushes: PushService);
    /** Makes the card of a membership, or brings its name up to date. The card's id is the membership id. */
    upsertForMembership(membershipId: string, options?: MemberCardOptions): Promise<MemberCardResult>;
    /** One try; null when another write took the device's next seq first (then the caller tries again). */
    private tryOnce;
}
