import type { ConflictRecord, PullResponse, PushResponse } from '@breakline/sync-protocol';
import { type Principal } from '../auth/principal.js';
import { PushService } from './push.service.js';
import { PullService } from './pull.service.js';
import { ConflictsService } from './conflicts.service.js';
/** The sync contract, version 1: bodies are validated by sync-protocol's schemas in the services. */
export declare class SyncController {
    private readonly pushes;
    private readonly pulls;
    private readonly conflicts;
    constructor(pushes: PushService, pulls: PullService, conflicts: ConflictsService);
    push(p: Principal, body: unknown): Promise<PushResponse>;
    pull(p: Principal, query: Record<string, unknown>): Promise<PullResponse>;
    /** What a phone shows in its sync status; any member may ask. */
    status(p: Principal): Promise<{
        openConflicts: number;
    }>;
    list(p: Principal, status?: string): Promise<ConflictRecord[]>;
    settle(p: Principal, id: string, body: Record<string, unknown>): Promise<ConflictRecord>;
}
