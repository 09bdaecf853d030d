import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import {
  addDays, daysBetween, seasonFigures, utcToLocal,
  type SeasonDefect, type SeasonIncident, type SeasonTrip,
} from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import { Club } from '../clubs/club.entity.js';
import { clubDayRange } from '../review/club-days.js';
import type { BoatHours, SeasonReportDto } from './season.types.js';

/** The longest range one report covers; a longer one is two reports. */
export const MAX_REPORT_DAYS = 731;
const SEASON_INCIDENTS = ['rescue', 'assist', 'first-aid', 'near-miss'] as const;
const HOUR = 3_600_000;

/** Monday (ISO 8601 week start) of a local date; day 0 of the day count, 1970-01-01, was a Thursday. */
export function weekOf(date: string): string {
  const isoWeekday = ((daysBetween('1970-01-01', date) % 7) + 7 + 3) % 7 + 1;
  return addDays(date, 1 - isoWeekday);
}

export function checkRange(from: string | undefined, to: string | undefined): { from: string; to: string } {
  const DATE = /^\d{4}-\d{2}-\d{2}$/;
  if (!from || !to || !DATE.test(from) || !DATE.test(to)) {
    throw new AppError(400, 'validation_failed', 'Give the season as from and to dates, such as from=2026-09-01&to=2027-04-30.');
  }
  let days: number;
  try {
    days = daysBetween(from, to);
  } catch (e) {
    throw new AppError(400, 'validation_failed', `${(e as Error).message}.`);
  }
  if (days < 0) throw new AppError(400, 'validation_failed', `The season starts (${from}) after it ends (${to}); swap the dates.`);
  if (days >= MAX_REPORT_DAYS) throw new AppError(400, 'validation_failed', `A report covers at most ${MAX_REPORT_DAYS} days; split ${from} to ${to} into shorter ranges.`);
  return { from, to };
}

/**
 * Season figures from the club's trips, incident notes and defects, computed by the same shared
 * rules (sync-protocol) the phones use. Trips count in the week and range of their launch,
 * incidents of when they happened, defects of when they were reported.
 */
@Injectable()
export class SeasonService {
  constructor(private readonly db: DataSource) {}

  async figures(clubId: string, fromDate: string | undefined, toDate: string | undefined, now = new Date()): Promise<SeasonReportDto> {
    const { from, to } = checkRange(fromDate, toDate);
    const club = await this.db.getRepository(Club).findOneBy({ id: clubId });
    if (!club) throw new AppError(404, 'not_found', 'No such club among yours.');
    const zone = club.timeZone;
    const { fromUtc, toUtc } = clubDayRange(from, to, zone) as { fromUtc: string; toUtc: string };
    const inRange = (col: string) => `club_id = $1 AND NOT deleted AND ${col} >= $2 AND ${col} < $3`;
    const args = [clubId, fromUtc, toUtc];
    const [tripRows, incidentRows, defectRows, verifiedRows, boatRows] = await Promise.all([
      this.db.query(`SELECT id, boat_id, motor_id, driver_id, purpose, launched_at, retrieved_at FROM trips WHERE ${inRange('launched_at')}`, args),
      this.db.query(`SELECT kind, people_helped FROM incident_notes WHERE ${inRange('occurred_at')}`, args),
      this.db.query(`SELECT reported_at, repaired_at, status FROM defects WHERE ${inRange('reported_at')}`, args),
      this.db.query(`SELECT verified_at FROM defects WHERE status = 'verified' AND ${inRange('verified_at')}`, args),
      this.db.query(`SELECT id, name, fleet_number, deleted FROM boats WHERE club_id = $1`, [clubId]),
    ]);

    const trips: SeasonTrip[] = tripRows.map((t: Record<string, string | null>) => ({
      id: t.id!, boatId: t.boat_id!, motorId: t.motor_id, driverId: t.driver_id!, purpose: t.purpose as SeasonTrip['purpose'],
      launchedAt: t.launched_at!, retrievedAt: t.retrieved_at,
    }));
    const incidents: SeasonIncident[] = incidentRows
      .filter((i: { kind: string }) => (SEASON_INCIDENTS as readonly string[]).includes(i.kind))
      .map((i: { kind: SeasonIncident['kind']; people_helped: number | null }) => ({ kind: i.kind, persons: i.people_helped ?? undefined }));
    const defects: SeasonDefect[] = defectRows.map((d: Record<string, string | null>) => ({
      reportedAt: d.reported_at!, repairedAt: d.repaired_at, status: d.status as SeasonDefect['status'],
    }));
    let f;
    try {
      f = seasonFigures(trips, incidents, defects);
    } catch (e) {
      throw new AppError(422, 'validation_failed', `The figures cannot be worked out: ${(e as Error).message}. Correct that record, then ask again.`);
    }

    const weeks: string[] = [];
    for (let w = weekOf(from); w <= to; w = addDays(w, 7)) weeks.push(w);
    const index = new Map(weeks.map((w, i) => [w, i]));
    const weekIndex = (iso: string) => index.get(weekOf(utcToLocal(iso, zone).date))!;

    const boats = new Map<string, BoatHours>();
    for (const b of boatRows as { id: string; name: string; fleet_number: string; deleted: boolean }[]) {
      if (!b.deleted) boats.set(b.id, { boatId: b.id, boatName: b.name, fleetNumber: b.fleet_number, totalHours: 0, weekly: weeks.map(() => 0) });
    }
    const named = new Map((boatRows as { id: string; name: string; fleet_number: string }[]).map((b) => [b.id, b]));
    for (const t of trips) {
      if (t.retrievedAt === null) continue;
      let row = boats.get(t.boatId);
      if (!row) {
        const b = named.get(t.boatId);
        row = { boatId: t.boatId, boatName: b?.name ?? null, fleetNumber: b?.fleet_number ?? null, totalHours: 0, weekly: weeks.map(() => 0) };
        boats.set(t.boatId, row);
      }
      row.weekly[weekIndex(t.launchedAt)]! += (Date.parse(t.retrievedAt) - Date.parse(t.launchedAt)) / HOUR;
    }
    for (const row of boats.values()) row.totalHours = f.hoursOnWater.byBoat[row.boatId] ?? 0;

    const weekly = weeks.map((week) => ({ week, raised: 0, returnedToService: 0 }));
    for (const d of defectRows as { reported_at: string }[]) weekly[weekIndex(d.reported_at)]!.raised += 1;
    // Returns to service count in the week they happened, whenever the defect was raised.
    for (const d of verifiedRows as { verified_at: string }[]) weekly[weekIndex(d.verified_at)]!.returnedToService += 1;

    return {
      club: { id: club.id, name: club.name, timeZone: zone },
      from, to, generatedAt: now.toISOString(), weeks,
      hoursOnWater: {
        total: f.hoursOnWater.total,
        byBoat: [...boats.values()].sort((a, b) => String(a.fleetNumber ?? a.boatId).localeCompare(String(b.fleetNumber ?? b.boatId), undefined, { numeric: true })),
      },
      trips: { total: trips.length, open: f.openTrips, byPurpose: f.tripsByPurpose },
      defects: {
        raised: f.defectsRaised, closed: f.defectsClosed, medianHoursToRepair: f.medianHoursToRepair,
        repairedCount: defects.filter((d) => d.repairedAt !== null).length, weekly,
      },
      rescues: f.rescues,
      assists: f.assists,
    };
  }
}
