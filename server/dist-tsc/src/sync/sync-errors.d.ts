/** The shared rules throw SyncRequestError; the API answers with its usual error body. */
export declare function toAppError(e: unknown): unknown;
/** An outdated app gets 426 before anything else is read, so it updates and then syncs. */
export declare function assertProtocol(body: unknown): void;
