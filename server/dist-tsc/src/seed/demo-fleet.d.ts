import type { KindFields } from '@breakline/sync-protocol';
export declare const BOATS: {
    id: string;
    fields: KindFields['boat'];
}[];
export declare function motors(today: string): {
    id: string;
    fields: KindFields['motor'];
}[];
/** Where the motors have been: IRB 2's motor away for a starter cord, the spare standing in. */
export declare function motorMoves(people: {
    captain: string;
    driver: string;
}, day: (offset: number) => string): {
    id: string;
    fields: KindFields['motorMove'];
}[];
