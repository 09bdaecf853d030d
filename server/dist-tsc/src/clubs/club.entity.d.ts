export declare const PRESSURE_UNITS: readonly ["kPa", "psi", "bar", "mbar"];
export declare const WIND_UNITS: readonly ["kn", "km/h", "m/s"];
export type PressureUnit = (typeof PRESSURE_UNITS)[number];
export type WindUnit = (typeof WIND_UNITS)[number];
/** What sign-on does for a member without a current award for the role: warn, or refuse. */
export declare const AWARD_CHECKS: readonly ["warn", "block"];
export type AwardCheck = (typeof AWARD_CHECKS)[number];
/** A surf lifesaving club: the tenant every club-owned row points to. */
export declare class Club {
    id: string;
    name: string;
    slug: string;
    /** IANA time-zone name, e.g. Australia/Sydney. */
    timeZone: string;
    /** WGS 84 degrees of the patrolled beach, for daylight warnings. */
    latitude: number;
    longitude: number;
    pressureUnit: PressureUnit;
    windUnit: WindUnit;
    awardCheck: AwardCheck;
    createdAt: Date;
}
