import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { AppError } from '../common/app-error.js';
import type { Principal } from '../auth/principal.js';
import { Club } from './club.entity.js';
import { MembershipsService } from './memberships.service.js';
import type { ClubDto, MemberDto } from './dto/club.dto.js';
import type { ClubSettingsDto } from './dto/club-settings.dto.js';

@Injectable()
export class ClubsService {
  constructor(
    @InjectRepository(Club) private readonly clubs: Repository<Club>,
    private readonly memberships: MembershipsService,
  ) {}

  /** A club's settings, only for the caller's own active club. */
  async get(p: Principal, clubId: string): Promise<ClubDto> {
    // Another club's id answers exactly like an unknown one: nothing leaks about other tenants.
    const club = clubId === p.clubId ? await this.clubs.findOne({ where: { id: p.clubId } }) : null;
    if (!club) throw new AppError(404, 'not_found', 'No such club among yours.');
    return toClubDto(club);
  }

  async update(p: Principal, settings: ClubSettingsDto): Promise<ClubDto> {
    const changes = Object.fromEntries(Object.entries(settings).filter(([, v]) => v !== undefined));
    if (Object.keys(changes).length > 0) await this.clubs.update({ id: p.clubId }, changes);
    return this.get(p, p.clubId);
  }

  async members(p: Principal): Promise<MemberDto[]> {
    const rows = await this.memberships.inClub(p.clubId);
    return rows.map((m) => ({ membershipId: m.id, userId: m.userId, displayName: m.user!.displayName, email: m.user!.email, role: m.role }));
  }
}

export function toClubDto(c: Club): ClubDto {
  return {
    id: c.id, name: c.name, timeZone: c.timeZone, latitude: c.latitude, longitude: c.longitude,
    pressureUnit: c.pressureUnit, windUnit: c.windUnit, awardCheck: c.awardCheck,
  };
}
