var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Injectable, Logger } from '@nestjs/common';
import bcrypt from 'bcryptjs';
import { DataSource, IsNull } from 'typeorm';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';
import { AuthService } from '../auth/auth.service.js';
import { Club } from '../clubs/club.entity.js';
import { Membership } from '../clubs/membership.entity.js';
import { MemberCardsService } from '../clubs/member-cards.service.js';
import { User } from '../users/user.entity.js';
import { MailService } from '../mail/mail.service.js';
import { appUrl } from '../mail/app-url.js';
import { Invite } from './invite.entity.js';
import { linkToken, newSecret, secretMatches, splitToken } from './link-token.js';
import { inviteMail } from './mail-texts.js';
import { NEW_PASSWORD_MIN } from './dto/fields.js';
const INVALID = 'This invitation link is not valid. Open the whole link from the e-mail, or ask your club admin for a new invitation.';
/** Invitations by e-mail: an admin sends one; the person accepts with the link and is signed in. */
let InvitesService = class InvitesService {
    db;
    env;
    mail;
    auth;
    cards;
    log = new Logger('Invites');
    constructor(db, env, mail, auth, cards) {
        this.db = db;
        this.env = env;
        this.mail = mail;
        this.auth = auth;
        this.cards = cards;
    }
    async create(p, dto) {
        this.mail.assertEnabled();
        const club = await this.db.getRepository(Club).findOneByOrFail({ id: p.clubId });
        const inviter = await this.db.getRepository(User).findOneByOrFail({ id: p.userId });
        const [member] = await this.db.query('SELECT 1 FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.club_id = $1 AND u.email = $2', [p.clubId, dto.email]);
        if (member)
            throw new AppError(409, 'conflict', `${dto.email} is already a member of ${club.name}; change their role on the members list instead.`);
        const { secret, hash } = newSecret();
        const expiresAt = new Date(Date.now() + this.env.INVITE_TTL_HOURS * 3_600_000);
        const invite = await this.db.transaction(async (em) => {
            // A newer invitation replaces older ones to the same address, so only the latest link works.
            await em.update(Invite, { clubId: p.clubId, email: dto.email, acceptedAt: IsNull(), revokedAt: IsNull() }, { revokedAt: new Date() });
            const row = await em.save(em.create(Invite, {
                clubId: p.clubId, email: dto.email, role: dto.role, secretHash: hash, invitedBy: p.userId, expiresAt, acceptedAt: null, acceptedBy: null, revokedAt: null,
            }));
            const link = `${appUrl(this.env)}/accept-invite#token=${linkToken(row.id, secret)}`;
            await this.mail.queue(inviteMail({ to: dto.email, clubName: club.name, inviter: inviter.displayName, role: dto.role, link, expiresAt, zone: club.timeZone }), em);
            return row;
        });
        this.mail.nudge();
        return toDto(invite, inviter.displayName);
    }
    async list(p) {
        const rows = await this.db.getRepository(Invite).createQueryBuilder('i')
            .leftJoin(User, 'u', 'u.id = i.invited_by')
            .addSelect('u.display_name', 'inviter_name')
            .where('i.club_id = :club', { club: p.clubId })
            .orderBy('i.created_at', 'DESC').limit(500)
            .getRawAndEntities();
        return rows.entities.map((inv, i) => toDto(inv, rows.raw[i].inviter_name));
    }
    async withdraw(p, id) {
        const repo = this.db.getRepository(Invite);
        const row = await repo.findOneBy({ id, clubId: p.clubId });
        if (!row)
            throw new AppError(404, 'not_found', 'There is no such invitation in your club.');
        if (row.acceptedAt)
            throw new AppError(409, 'conflict', `${row.email} has already accepted this invitation; change their role on the members list instead.`);
        if (!row.revokedAt)
            await repo.update({ id, revokedAt: IsNull(), acceptedAt: IsNull() }, { revokedAt: new Date() });
    }
    async accept(dto) {
        const parts = splitToken(dto.token);
        if (!parts)
            throw new AppError(400, 'link_invalid', INVALID);
        const { user, clubId, membershipId } = await this.db.transaction(async (em) => {
            const invite = await em.findOne(Invite, { where: { id: parts.id }, lock: { mode: 'pessimistic_write' } });
            if (!invite || !secretMatches(invite.secretHash, parts.secret))
                throw new AppError(400, 'link_invalid', INVALID);
            if (invite.acceptedAt)
                throw new AppError(410, 'link_used', 'This invitation has already been accepted. Sign in with your e-mail and password.');
            if (invite.revokedAt)
                throw new AppError(410, 'link_invalid', 'This invitation was withdrawn or replaced by a newer one. Use the newest invitation e-mail, or ask your club admin.');
            if (invite.expiresAt.getTime() <= Date.now())
                throw new AppError(410, 'link_expired', 'This invitation has expired. Ask your club admin to send a new one.');
            let user = await em.findOne(User, { where: { email: invite.email } });
            if (user) {
                // The link proves the address; the password proves the account, which may hold other clubs.
                if (!(await bcrypt.compare(dto.password, user.passwordHash))) {
                    throw new AppError(401, 'invalid_credentials', `${invite.email} already has a Breakline account. Enter that account's password to join the club, or reset the password first.`);
                }
            }
            else {
                const problems = [];
                if (!dto.displayName)
                    problems.push({ field: 'displayName', message: 'Enter the name other members will see.' });
                if (dto.password.length < NEW_PASSWORD_MIN)
                    problems.push({ field: 'password', message: `Choose a password of at least ${NEW_PASSWORD_MIN} characters; a few words strung together work well.` });
                if (problems.length)
                    throw new AppError(400, 'validation_failed', 'Some fields need fixing.', problems);
                user = await em.save(em.create(User, { email: invite.email, displayName: dto.displayName, passwordHash: await bcrypt.hash(dto.password, 10) }));
            }
            let membership = await em.findOne(Membership, { where: { clubId: invite.clubId, userId: user.id } });
            membership ??= await em.save(em.create(Membership, { clubId: invite.clubId, userId: user.id, role: invite.role }));
            await em.update(Invite, { id: invite.id }, { acceptedAt: new Date(), acceptedBy: user.id });
            return { user, clubId: invite.clubId, membershipId: membership.id };
        });
        // The card is a synced record written by its own push; the membership stands without it.
        await this.cards.upsertForMembership(membershipId, { byUserId: user.id }).catch((e) => this.log.error(`The member card of membership ${membershipId} was not made: ${e.message}`));
        return this.auth.startSession(user, clubId);
    }
};
InvitesService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [DataSource,
        Env,
        MailService,
        AuthService,
        MemberCardsService])
], InvitesService);
export { InvitesService };
function statusOf(i) {
    if (i.acceptedAt)
        return 'accepted';
    if (i.revokedAt)
        return 'withdrawn';
    return i.expiresAt.getTime() <= Date.now() ? 'expired' : 'pending';
}
function toDto(i, inviterName) {
    return {
        id: i.id, email: i.email, role: i.role, status: statusOf(i), invitedBy: { id: i.invitedBy, name: inviterName },
        createdAt: i.createdAt.toISOString(), expiresAt: i.expiresAt.toISOString(), acceptedAt: i.acceptedAt?.toISOString() ?? null,
    };
}
//# sourceMappingURL=invites.service.js.map