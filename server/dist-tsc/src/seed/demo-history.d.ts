import type { KindFields } from '@breakline/sync-protocol';
import type { DemoPeople } from './demo-records.js';
type Day = (offset: number) => string;
export declare function demoChecks(p: DemoPeople, day: Day): {
    id: string;
    fields: KindFields['check'];
}[];
export declare function demoDefects(p: DemoPeople, day: Day): {
    id: string;
    fields: KindFields['defect'];
}[];
export {};
