import { type Principal } from '../auth/principal.js';
import type { SessionDto } from '../auth/dto/session.dto.js';
import { InvitesService } from './invites.service.js';
import { AcceptInviteDto, CreateInviteDto, type InviteDto } from './dto/invite.dto.js';
export declare class InvitesController {
    private readonly invites;
    constructor(invites: InvitesService);
    create(p: Principal, dto: CreateInviteDto): Promise<InviteDto>;
    list(p: Principal): Promise<InviteDto[]>;
    withdraw(p: Principal, id: string): Promise<void>;
    /** Accepting needs no sign-in: the link's token is the proof. Answers like a sign-in. */
    accept(dto: AcceptInviteDto): Promise<SessionDto>;
}
