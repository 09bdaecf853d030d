/**
 * The instant a local calendar day starts at the club. Where midnight happens twice the day starts
 * at the first; where the clocks skip it, at the moment they jump.
 */
export declare function dayStartUtc(date: string, zone: string): string;
/** [start of `from`, start of the day after `to`) at the club, as UTC instants; either end may be open. */
export declare function clubDayRange(from: string | undefined, to: string | undefined, zone: string): {
    fromUtc?: string;
    toUtc?: string;
};
