import { DataSource } from 'typeorm';
import { type RecordKind } from '@breakline/sync-protocol';
import type { Principal } from '../auth/principal.js';
export interface FieldChange {
    from: unknown;
    to: unknown;
    label: string;
}
export interface VersionDto {
    version: number;
    hlc: string;
    /** When the server accepted the change. */
    at: string;
    user: {
        id: string;
        name: string | null;
    };
    deviceId: string;
    /** applied, merged, conflict (kept with a conflict to settle) or settled (a supervisor's settlement). */
    status: string;
    deleted: boolean;
    changes: Record<string, FieldChange>;
}
export interface HistoryDto {
    kind: RecordKind;
    id: string;
    versions: VersionDto[];
}
/** A record's versions from the change log: who, when, from which device, and what each changed. */
export declare class HistoryService {
    private readonly db;
    constructor(db: DataSource);
    history(p: Principal, kind: string, id: string): Promise<HistoryDto>;
}
