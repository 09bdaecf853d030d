/** A person who can sign in. Roles live on memberships, one per club. */
export declare class User {
    id: string;
    /** Stored lower-cased so sign-in is case-insensitive. */
    email: string;
    displayName: string;
    passwordHash: string;
    createdAt: Date;
}
