var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { addDays, daysBetween, seasonFigures, utcToLocal, } from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import { Club } from '../clubs/club.entity.js';
import { clubDayRange } from '../review/club-days.js';
/** The longest range one report covers; a longer one is two reports. */
export const MAX_REPORT_DAYS = 731;
const SEASON_INCIDENTS = ['rescue', 'assist', 'first-aid', 'near-miss'];
const HOUR = 3_600_000;
/** Monday (ISO 8601 week start) of a local date; day 0 of the day count, 1970-01-01, was a Thursday. */
export function weekOf(date) {
    const isoWeekday = ((daysBetween('1970-01-01', date) % 7) + 7 + 3) % 7 + 1;
    return addDays(date, 1 - isoWeekday);
}
export function checkRange(from, to) {
    const DATE = /^\d{4}-\d{2}-\d{2}$/;
    if (!from || !to || !DATE.test(from) || !DATE.test(to)) {
        throw new AppError(400, 'validation_failed', 'Give the season as from and to dates, such as from=2026-09-01&to=2027-04-30.');
    }
    let days;
    try {
        days = daysBetween(from, to);
    }
    catch (e) {
        throw new AppError(400, 'validation_failed', `${e.message}.`);
    }
    if (days < 0)
        throw new AppError(400, 'validation_failed', `The season starts (${from}) after it ends (${to}); swap the dates.`);
    if (days >= MAX_REPORT_DAYS)
        throw new AppError(400, 'validation_failed', `A report covers at most ${MAX_REPORT_DAYS} days; split ${from} to ${to} into shorter ranges.`);
    return { from, to };
}
/**
 * Season figures from the club's trips, incident notes and defects, computed by the same shared
 * rules (sync-protocol) the phones use. Trips count in the week and range of their launch,
 * incidents of when they happened, defects of when they were reported.
 */
let SeasonService = class SeasonService {
    db;
    constructor(db) {
        this.db = db;
    }
    async figures(clubId, fromDate, toDate, now = new Date()) {
        const { from, to } = checkRange(fromDate, toDate);
        const club = await this.db.getRepository(Club).findOneBy({ id: clubId });
        if (!club)
            throw new AppError(404, 'not_found', 'No such club among yours.');
        const zone = club.timeZone;
        const { fromUtc, toUtc } = clubDayRange(from, to, zone);
        const inRange = (col) => `club_id = $1 AND NOT deleted AND ${col} >= $2 AND ${col} < $3`;
        const args = [clubId, fromUtc, toUtc];
        const [tripRows, incidentRows, defectRows, verifiedRows, boatRows] = await Promise.all([
            this.db.query(`SELECT id, boat_id, motor_id, driver_id, purpose, launched_at, retrieved_at FROM trips WHERE ${inRange('launched_at')}`, args),
            this.db.query(`SELECT kind, people_helped FROM incident_notes WHERE ${inRange('occurred_at')}`, args),
            this.db.query(`SELECT reported_at, repaired_at, status FROM defects WHERE ${inRange('reported_at')}`, args),
            this.db.query(`SELECT verified_at FROM defects WHERE status = 'verified' AND ${inRange('verified_at')}`, args),
            this.db.query(`SELECT id, name, fleet_number, deleted FROM boats WHERE club_id = $1`, [clubId]),
        ]);
        const trips = tripRows.map((t) => ({
            id: t.id, boatId: t.boat_id, motorId: t.motor_id, driverId: t.driver_id, purpose: t.purpose,
            launchedAt: t.launched_at, retrievedAt: t.retrieved_at,
        }));
        const incidents = incidentRows
            .filter((i) => SEASON_INCIDENTS.includes(i.kind))
            .map((i) => ({ kind: i.kind, persons: i.people_helped ?? undefined }));
        const defects = defectRows.map((d) => ({
            reportedAt: d.reported_at, repairedAt: d.repaired_at, status: d.status,
        }));
        let f;
        try {
            f = seasonFigures(trips, incidents, defects);
        }
        catch (e) {
            throw new AppError(422, 'validation_failed', `The figures cannot be worked out: ${e.message}. Correct that record, then ask again.`);
        }
        const weeks = [];
        for (let w = weekOf(from); w <= to; w = addDays(w, 7))
            weeks.push(w);
        const index = new Map(weeks.map((w, i) => [w, i]));
        const weekIndex = (iso) => index.get(weekOf(utcToLocal(iso, zone).date));
        const boats = new Map();
        for (const b of boatRows) {
            if (!b.deleted)
                boats.set(b.id, { boatId: b.id, boatName: b.name, fleetNumber: b.fleet_number, totalHours: 0, weekly: weeks.map(() => 0) });
        }
        const named = new Map(boatRows.map((b) => [b.id, b]));
        for (const t of trips) {
            if (t.retrievedAt === null)
                continue;
            let row = boats.get(t.boatId);
            if (!row) {
                const b = named.get(t.boatId);
                row = { boatId: t.boatId, boatName: b?.name ?? null, fleetNumber: b?.fleet_number ?? null, totalHours: 0, weekly: weeks.map(() => 0) };
                boats.set(t.boatId, row);
            }
            row.weekly[weekIndex(t.launchedAt)] += (Date.parse(t.retrievedAt) - Date.parse(t.launchedAt)) / HOUR;
        }
        for (const row of boats.values())
            row.totalHours = f.hoursOnWater.byBoat[row.boatId] ?? 0;
        const weekly = weeks.map((week) => ({ week, raised: 0, returnedToService: 0 }));
        for (const d of defectRows)
            weekly[weekIndex(d.reported_at)].raised += 1;
        // Returns to service count in the week they happened, whenever the defect was raised.
        for (const d of verifiedRows)
            weekly[weekIndex(d.verified_at)].returnedToService += 1;
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
};
SeasonService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [DataSource])
], SeasonService);
export { SeasonService };
//# sourceMappingURL=season.service.js.map