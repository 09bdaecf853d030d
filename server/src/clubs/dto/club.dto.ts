import type { Role } from '@breakline/sync-protocol';

export interface ClubDto {
  id: string; name: string; timeZone: string; latitude: number; longitude: number;
  pressureUnit: string; windUnit: string;
}

export interface MemberDto { userId: string; displayName: string; email: string; role: Role }
