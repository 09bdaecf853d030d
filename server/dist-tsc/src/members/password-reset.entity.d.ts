/** A mailed link to set a new password: only a SHA-256 of its secret is kept; it works once. */
export declare class PasswordReset {
    id: string;
    userId: string;
    secretHash: string;
    expiresAt: Date;
    /** Set when the link is used, or when a newer link replaces it. */
    usedAt: Date | null;
    createdAt: Date;
}
