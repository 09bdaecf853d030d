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
import { User } from '../users/user.entity.js';
import { MailService } from '../mail/mail.service.js';
import { appUrl } from '../mail/app-url.js';
import { PasswordReset } from './password-reset.entity.js';
import { linkToken, newSecret, secretMatches, splitToken } from './link-token.js';
import { resetMail } from './mail-texts.js';
const INVALID = 'This password link is not valid. Open the whole link from the e-mail, or ask for a new one.';
/** Password reset by a mailed single-use link; the request's answer never says whether the address has an account. */
let PasswordResetService = class PasswordResetService {
    db;
    env;
    mail;
    auth;
    log = new Logger('PasswordReset');
    constructor(db, env, mail, auth) {
        this.db = db;
        this.env = env;
        this.mail = mail;
        this.auth = auth;
    }
    /**
     * Answers at once; the lookup and the mail happen afterwards, so the time to answer is the same
     * whether or not the address has an account.
     */
    request(email) {
        void this.issue(email).catch((e) => this.log.error(`A password link for ${email} was not sent: ${e.message}`));
    }
    async issue(email) {
        const user = await this.db.getRepository(User).findOneBy({ email });
        if (!user)
            return;
        if (!this.mail.enabled) {
            this.log.warn(`A password link was asked for ${email}, but e-mail is off (SMTP_HOST is not set).`);
            return;
        }
        const { secret, hash } = newSecret();
        const minutes = this.env.PASSWORD_RESET_TTL_MINUTES;
        await this.db.transaction(async (em) => {
            // Only the newest link works.
            await em.update(PasswordReset, { userId: user.id, usedAt: IsNull() }, { usedAt: new Date() });
            const row = await em.save(em.create(PasswordReset, { userId: user.id, secretHash: hash, expiresAt: new Date(Date.now() + minutes * 60_000), usedAt: null }));
            const link = `${appUrl(this.env)}/reset-password#token=${linkToken(row.id, secret)}`;
            await this.mail.queue(resetMail({ to: user.email, name: user.displayName, link, minutes }), em);
        });
        this.mail.nudge();
    }
    /** Sets the new password, ends every other sign-in of the person, and signs them in. */
    async confirm(token, password) {
        const parts = splitToken(token);
        if (!parts)
            throw new AppError(400, 'link_invalid', INVALID);
        const user = await this.db.transaction(async (em) => {
            const row = await em.findOne(PasswordReset, { where: { id: parts.id }, lock: { mode: 'pessimistic_write' } });
            if (!row || !secretMatches(row.secretHash, parts.secret))
                throw new AppError(400, 'link_invalid', INVALID);
            if (row.usedAt)
                throw new AppError(410, 'link_used', 'This password link has already been used or replaced by a newer one. Ask for a new link if you still need one.');
            if (row.expiresAt.getTime() <= Date.now())
                throw new AppError(410, 'link_expired', 'This password link has expired. Ask for a new one on the sign-in page.');
            const found = await em.findOne(User, { where: { id: row.userId } });
            if (!found)
                throw new AppError(400, 'link_invalid', INVALID);
            found.passwordHash = await bcrypt.hash(password, 10);
            await em.update(User, { id: found.id }, { passwordHash: found.passwordHash });
            await em.update(PasswordReset, { id: row.id }, { usedAt: new Date() });
            await em.query('UPDATE refresh_tokens SET revoked_at = now() WHERE user_id = $1 AND revoked_at IS NULL', [found.id]);
            return found;
        });
        return this.auth.startSession(user);
    }
};
PasswordResetService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [DataSource, Env, MailService, AuthService])
], PasswordResetService);
export { PasswordResetService };
//# sourceMappingURL=password-reset.service.js.map