import type { Role } from '@breakline/sync-protocol';
/**
 * An invitation to join a club by e-mail. Only a SHA-256 of the link's secret is kept; the link
 * works once, until it expires or a newer invitation to the same address replaces it.
 */
export declare class Invite {
    id: string;
    clubId: string;
    /** Lower-cased, like users.email. */
    email: string;
    role: Role;
    secretHash: string;
    invitedBy: string;
    expiresAt: Date;
    acceptedAt: Date | null;
    acceptedBy: string | null;
    /** Withdrawn by an admin or replaced by a newer invitation. */
    revokedAt: Date | null;
    createdAt: Date;
}
