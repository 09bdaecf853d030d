/** Tokens in mailed links are `<row id>.<secret>`; the row keeps only the secret's SHA-256. */
export declare function newSecret(): {
    secret: string;
    hash: string;
};
export declare const linkToken: (id: string, secret: string) => string;
/** The row id and secret of a token, or null when it cannot be one of ours. */
export declare function splitToken(token: string): {
    id: string;
    secret: string;
} | null;
export declare function secretMatches(hash: string, secret: string): boolean;
