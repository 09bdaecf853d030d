import { DataSource } from 'typeorm';
import { Env } from '../config/env.js';
import type { Principal } from '../auth/principal.js';
import { AuthService } from '../auth/auth.service.js';
import type { SessionDto } from '../auth/dto/session.dto.js';
import { MemberCardsService } from '../clubs/member-cards.service.js';
import { MailService } from '../mail/mail.service.js';
import type { AcceptInviteDto, CreateInviteDto, InviteDto } from './dto/invite.dto.js';
/** Invitations by e-mail: an admin sends one; the person accepts with the link and is signed in. */
export declare class InvitesService {
    private readonly db;
    private readonly env;
    private readonly mail;
    private readonly auth;
    private readonly cards;
    private readonly log;
    constructor(db: DataSource, env: Env, mail: MailService, auth: AuthService, cards: MemberCardsService);
    create(p: Principal, dto: CreateInviteDto): Promise<InviteDto>;
    list(p: Principal): Promise<InviteDto[]>;
    withdraw(p: Principal, id: string): Promise<void>;
    accept(dto: AcceptInviteDto): Promise<SessionDto>;
}
