import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { encodeHlc, PROTOCOL_VERSION, type KindFields, type MemberAward, type Mutation } from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import type { Principal } from '../auth/principal.js';
import { recordStore } from '../records/record-store.js';
import { MEMBER_CARDS_DEVICE, PushService } from '../sync/push.service.js';
import { Membership } from './membership.entity.js';

/** The server's own device for member cards; its seq counts on from what the club has accepted. */
export { MEMBER_CARDS_DEVICE };
const ATTEMPTS = 3;

export interface MemberCardOptions {
  /** Awards for a card made now; an existing card keeps its awards (a supervisor keeps them). */
  awards?: MemberAward[];
  /** Who the change is recorded as made by; the member themselves when not given. */
  byUserId?: string;
}

export type MemberCardResult = { recordId: string; status: 'created' | 'updated' | 'unchanged' };

/**
 * Member cards: the synced record (kind `member`) every phone of the club reads for names and
 * awards. Written through the same push rules as a phone's change, so it reaches phones by the
 * ordinary pull, and a second call for the same membership changes nothing.
 */
@Injectable()
export class MemberCardsService {
  constructor(private readonly db: DataSource, private readonly pushes: PushService) {}

  /** Makes the card of a membership, or brings its name up to date. The card's id is the membership id. */
  async upsertForMembership(membershipId: string, options: MemberCardOptions = {}): Promise<MemberCardResult> {
    for (let attempt = 0; attempt < ATTEMPTS; attempt++) {
      const result = await this.tryOnce(membershipId, options);
      if (result) return result;
    }
    throw new AppError(409, 'conflict', 'The member card changed while it was being saved; try again.');
  }

  /** One try; null when another write took the device's next seq first (then the caller tries again). */
  private async tryOnce(membershipId: string, options: MemberCardOptions): Promise<MemberCardResult | null> {
    const membership = await this.db.getRepository(Membership).findOne({ where: { id: membershipId }, relations: { user: true } });
    if (!membership?.user) throw new AppError(404, 'not_found', `There is no membership ${membershipId}, so no member card was made.`);
    const [card] = await recordStore.loadMany(this.db.manager, 'member', [membershipId]);
    if (card?.deleted) {
      throw new AppError(409, 'conflict', `The member card of ${membership.user.displayName} was deleted; an admin must make a new one.`);
    }
    const displayName = membership.user.displayName;
    const fields = card?.fields as KindFields['member'] | undefined;
    if (fields && fields.displayName === displayName) return { recordId: membershipId, status: 'unchanged' };
    const [device] = await this.db.query('SELECT last_seq FROM sync_devices WHERE club_id = $1 AND device_id = $2', [membership.clubId, MEMBER_CARDS_DEVICE]);
    const mutation: Mutation = {
      mutationId: crypto.randomUUID(),
      seq: Number(device?.last_seq ?? 0) + 1,
      recordId: membershipId,
      kind: 'member',
      baseVersion: card?.version ?? 0,
      base: fields ? { displayName: fields.displayName } : {},
      hlc: encodeHlc({ l: Date.now(), c: 0, node: MEMBER_CARDS_DEVICE }),
      patch: fields ? { displayName } : { memberId: membership.userId, displayName, awards: options.awards ?? [] },
    };
    const principal: Principal = { userId: options.byUserId ?? membership.userId, clubId: membership.clubId, role: 'admin', membershipId };
    const res = await this.pushes.push(principal, { protocolVersion: PROTOCOL_VERSION, deviceId: MEMBER_CARDS_DEVICE, mutations: [mutation] }, { serverDevice: true });
    const [r] = res.results;
    if (!r || r.status === 'duplicate') return null;
    if (r.status === 'rejected') {
      throw new AppError(400, 'validation_failed', `The member card of ${displayName} was not saved: ${r.error?.message ?? 'refused'}`);
    }
    return { recordId: membershipId, status: fields ? 'updated' : 'created' };
  }
}
