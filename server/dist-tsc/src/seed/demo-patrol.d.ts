import { type RecordKind } from '@breakline/sync-protocol';
import type { DemoPeople } from './demo-records.js';
export interface DemoPlace {
    timeZone: string;
    latitude: number;
    longitude: number;
}
type Entry = [RecordKind, string, Record<string, unknown>];
/** The 24 weekend days of the season, oldest first. */
export declare function patrolDays(today: string): string[];
export declare function demoPatrol(p: DemoPeople, now: Date, place: DemoPlace, meters: Record<string, number>): Entry[];
export {};
