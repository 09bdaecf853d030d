import type { Role } from '@breakline/sync-protocol';
export declare const DEMO_PASSWORD = "surf-demo-2026";
export interface DemoClub {
    slug: string;
    name: string;
    timeZone: string;
    latitude: number;
    longitude: number;
    pressureUnit: 'kPa' | 'psi' | 'bar' | 'mbar';
    windUnit: 'kn' | 'km/h' | 'm/s';
    /** Sign-on without a current award: warn (the default) or refuse. */
    awardCheck?: 'warn' | 'block';
    members: {
        email: string;
        displayName: string;
        role: Role;
    }[];
}
export declare const DEMO_CLUBS: DemoClub[];
