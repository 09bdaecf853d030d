import { DataSource } from 'typeorm';
import { Env } from '../config/env.js';
import { AuthService } from '../auth/auth.service.js';
import type { SessionDto } from '../auth/dto/session.dto.js';
import { MailService } from '../mail/mail.service.js';
/** Password reset by a mailed single-use link; the request's answer never says whether the address has an account. */
export declare class PasswordResetService {
    private readonly db;
    private readonly env;
    private readonly mail;
    private readonly auth;
    private readonly log;
    constructor(db: DataSource, env: Env, mail: MailService, auth: AuthService);
    /**
     * Answers at once; the lookup and the mail happen afterwards, so the time to answer is the same
     * whether or not the address has an account.
     */
    request(email: string): void;
    private issue;
    /** Sets the new password, ends every other sign-in of the person, and signs them in. */
    confirm(token: string, password: string): Promise<SessionDto>;
}
