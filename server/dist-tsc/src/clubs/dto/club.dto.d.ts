import type { Role } from '@breakline/sync-protocol';
export interface ClubDto {
    id: string;
    name: string;
    timeZone: string;
    latitude: number;
    longitude: number;
    pressureUnit: string;
    windUnit: string;
    /** Sign-on without a current award: 'warn' (the default) or 'block'. */
    awardCheck: string;
}
export interface MemberDto {
    membershipId: string;
    userId: string;
    displayName: string;
    email: string;
    role: Role;
}
