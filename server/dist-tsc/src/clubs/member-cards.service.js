var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { encodeHlc, PROTOCOL_VERSION } from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import { recordStore } from '../records/record-store.js';
import { PushService } from '../sync/push.service.js';
import { Membership } from './membership.entity.js';
/** The server's own device for member cards; its seq counts on from what the club has accepted. */
export const MEMBER_CARDS_DEVICE = 'member-cards';
const ATTEMPTS = 3;
/**
 * Member cards: the synced record (kind `member`) every phone of the club reads for names and
 * awards. Written through the same push rules as a phone's change, so it reaches phones by the
 * ordinary pull, and a second call for the same membership changes nothing.
 */
let MemberCardsService = class MemberCardsService {
    db;
    pushes;
    constructor(db, pushes) {
        this.db = db;
        this.pushes = pushes;
    }
    /** Makes the card of a membership, or brings its name up to date. The card's id is the membership id. */
    async upsertForMembership(membershipId, options = {}) {
        for (let attempt = 0; attempt < ATTEMPTS; attempt++) {
            const result = await this.tryOnce(membershipId, options);
            if (result)
                return result;
        }
        throw new AppError(409, 'conflict', 'The member card changed while it was being saved; try again.');
    }
    /** One try; null when another write took the device's next seq first (then the caller tries again). */
    async tryOnce(membershipId, options) {
        const membership = await this.db.getRepository(Membership).findOne({ where: { id: membershipId }, relations: { user: true } });
        if (!membership?.user)
            throw new AppError(404, 'not_found', `There is no membership ${membershipId}, so no member card was made.`);
        const [card] = await recordStore.loadMany(this.db.manager, 'member', [membershipId]);
        if (card?.deleted) {
            throw new AppError(409, 'conflict', `The member card of ${membership.user.displayName} was deleted; an admin must make a new one.`);
        }
        const displayName = membership.user.displayName;
        const fields = card?.fields;
        if (fields && fields.displayName === displayName)
            return { recordId: membershipId, status: 'unchanged' };
        const [device] = await this.db.query('SELECT last_seq FROM sync_devices WHERE club_id = $1 AND device_id = $2', [membership.clubId, MEMBER_CARDS_DEVICE]);
        const mutation = {
            mutationId: crypto.randomUUID(),
            seq: Number(device?.last_seq ?? 0) + 1,
            recordId: membershipId,
            kind: 'member',
            baseVersion: card?.version ?? 0,
            base: fields ? { displayName: fields.displayName } : {},
            hlc: encodeHlc({ l: Date.now(), c: 0, node: MEMBER_CARDS_DEVICE }),
            patch: fields ? { displayName } : { memberId: membership.userId, displayName, awards: options.awards ?? [] },
        };
        const principal = { userId: options.byUserId ?? membership.userId, clubId: membership.clubId, role: 'admin', membershipId };
        const res = await this.pushes.push(principal, { protocolVersion: PROTOCOL_VERSION, deviceId: MEMBER_CARDS_DEVICE, mutations: [mutation] });
        const [r] = res.results;
        if (!r || r.status === 'duplicate')
            return null;
        if (r.status === 'rejected') {
            throw new AppError(400, 'validation_failed', `The member card of ${displayName} was not saved: ${r.error?.message ?? 'refused'}`);
        }
        return { recordId: membershipId, status: fields ? 'updated' : 'created' };
    }
};
MemberCardsService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [DataSource, PushService])
], MemberCardsService);
export { MemberCardsService };
//# sourceMappingURL=member-cards.service.js.map