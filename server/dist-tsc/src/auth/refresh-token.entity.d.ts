/**
 * One issued refresh token. Only a SHA-256 of its secret is kept. Tokens rotate: each use
 * revokes the token and issues the next in the same family; a revoked token presented again
 * revokes the whole family, since someone holds a copy.
 */
export declare class RefreshToken {
    id: string;
    userId: string;
    clubId: string;
    familyId: string;
    secretHash: string;
    expiresAt: Date;
    revokedAt: Date | null;
    createdAt: Date;
}
