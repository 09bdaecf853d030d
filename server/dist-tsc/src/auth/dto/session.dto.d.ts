import type { Role } from '@breakline/sync-protocol';
export interface UserDto {
    id: string;
    email: string;
    displayName: string;
}
export interface ActiveClubDto {
    id: string;
    name: string;
    timeZone: string;
    latitude: number;
    longitude: number;
    pressureUnit: string;
    windUnit: string;
    awardCheck: string;
    role: Role;
}
export interface MembershipDto {
    clubId: string;
    clubName: string;
    role: Role;
}
/** What `GET /api/auth/me` answers. */
export interface MeDto {
    user: UserDto;
    activeClub: ActiveClubDto;
    memberships: MembershipDto[];
}
/** What login, refresh and switch-club answer. */
export interface SessionDto extends MeDto {
    accessToken: string;
    refreshToken: string;
    accessExpiresAt: string;
}
