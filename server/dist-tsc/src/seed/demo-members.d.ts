import type { DataSource } from 'typeorm';
import { type MemberAward } from '@breakline/sync-protocol';
/** Each demo member's awards, by e-mail; `today` is the UTC date the demo is written. */
export declare function demoAwards(email: string, today: string): MemberAward[];
/** A card for every demo membership, written through the member-cards service as an invitation would. */
export declare function seedMemberCards(db: DataSource, now?: Date): Promise<number>;
