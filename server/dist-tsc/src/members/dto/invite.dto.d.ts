import { type Role } from '@breakline/sync-protocol';
export declare class CreateInviteDto {
    email: string;
    role: Role;
}
export declare class AcceptInviteDto {
    token: string;
    displayName?: string;
    password: string;
}
export type InviteStatus = 'pending' | 'accepted' | 'expired' | 'withdrawn';
/** What the invitation routes answer; the token itself is only ever in the e-mail. */
export interface InviteDto {
    id: string;
    email: string;
    role: Role;
    status: InviteStatus;
    invitedBy: {
        id: string;
        name: string | null;
    };
    createdAt: string;
    expiresAt: string;
    acceptedAt: string | null;
}
