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
import { DEFECT_SEVERITIES, roleAtLeast } from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import { Club } from '../clubs/club.entity.js';
import { snake } from '../records/columns.js';
import { rowToRecord } from '../records/record-rows.js';
import { clubDayRange } from './club-days.js';
import { nameKey, personAlias, TABLES, tableName, uid } from './review-tables.js';
const list = (values) => values.join(', ');
const bad = (message) => new AppError(400, 'validation_failed', message);
/** The desk's tables: a club's records of one kind, filtered, sorted and paged by the database. */
let ReviewService = class ReviewService {
    db;
    constructor(db) {
        this.db = db;
    }
    async page(p, table, q) {
        const plan = await this.plan(p, table, q);
        const page = q.page ?? 0;
        const pageSize = q.pageSize ?? 50;
        const [rows, [count]] = await Promise.all([
            this.db.query(`${plan.select} LIMIT ${pageSize} OFFSET ${page * pageSize}`, plan.params),
            this.db.query(plan.count, plan.params),
        ]);
        return { rows: rows.map((r) => toRow(TABLES[table], r)), total: count.n, page, pageSize };
    }
    /**
     * Every matching row, in the table's order, a batch at a time, read from one snapshot so rows
     * written meanwhile neither repeat nor go missing between batches.
     */
    async eachBatch(p, table, q, onBatch, size = 1000) {
        const plan = await this.plan(p, table, q);
        await this.db.transaction('REPEATABLE READ', async (em) => {
            for (let offset = 0;; offset += size) {
                const rows = await em.query(`${plan.select} LIMIT ${size} OFFSET ${offset}`, plan.params);
                if (rows.length)
                    await onBatch(rows.map((r) => toRow(TABLES[table], r)), plan.zone);
                if (rows.length < size)
                    break;
            }
        });
    }
    async zoneOf(clubId) {
        const club = await this.db.getRepository(Club).findOneBy({ id: clubId });
        if (!club)
            throw new AppError(404, 'not_found', 'No such club among yours.');
        return club.timeZone;
    }
    async plan(p, table, q) {
        const spec = TABLES[table];
        // Incident notes hold health information: on the desk a supervisor or admin reads them all,
        // anyone else only their own. The other tables are the supervisor's.
        const seeAll = roleAtLeast(p.role, 'supervisor');
        if (!seeAll && table !== 'incidentNotes') {
            throw new AppError(403, 'forbidden', `This needs the supervisor role or higher in this club; you are signed in as ${p.role}.`);
        }
        const zone = await this.zoneOf(p.clubId);
        const params = [p.clubId];
        const arg = (v) => { params.push(v); return `$${params.length}`; };
        const where = ['x.club_id = $1', 'NOT x.deleted'];
        const dateCol = `x.${snake(spec.date)}`;
        const range = clubDayRange(q.from, q.to, zone);
        if (range.fromUtc)
            where.push(`${dateCol} >= ${arg(range.fromUtc)}`);
        if (range.toUtc)
            where.push(`${dateCol} < ${arg(range.toUtc)}`);
        if (q.boatId)
            where.push(`x.boat_id = ${arg(q.boatId)}`);
        if (q.motorId) {
            if (!spec.hasMotor)
                throw bad(`Incident notes name no motor, so they cannot be filtered by motorId; filter by boatId instead.`);
            where.push(`x.motor_id = ${arg(q.motorId)}`);
        }
        if (q.memberId)
            where.push(spec.member.replaceAll('$M', arg(q.memberId)));
        if (q.state) {
            const states = Object.keys(spec.states);
            if (!states.length)
                throw bad(`The ${spec.words} table has no state filter.`);
            const cond = spec.states[q.state];
            if (!cond)
                throw bad(`state must be one of ${list(states)} for ${spec.words}.`);
            where.push(cond);
        }
        if (q.severity) {
            if (!spec.severity)
                throw bad(`Only defects have a severity; leave severity out for ${spec.words}.`);
            if (!DEFECT_SEVERITIES.includes(q.severity))
                throw bad(`severity must be one of ${list(DEFECT_SEVERITIES)}.`);
            where.push(`x.severity = ${arg(q.severity)}`);
        }
        if (q.type) {
            if (!spec.type)
                throw bad(`The ${spec.words} table has no type filter.`);
            if (!spec.type.values.includes(q.type))
                throw bad(`type must be one of ${list(spec.type.values)} for ${spec.words}.`);
            where.push(`x.${snake(spec.type.field)} = ${arg(q.type)}`);
        }
        if (!seeAll)
            where.push(`x.author_id = ${arg(p.userId)}`);
        const sortKey = q.sort ?? spec.date;
        const sortExpr = spec.sorts[sortKey];
        if (!sortExpr)
            throw bad(`The ${spec.words} table cannot be sorted by ${sortKey}; sort by one of ${list(Object.keys(spec.sorts))}.`);
        const dir = q.dir === 'asc' ? 'ASC' : 'DESC';
        // The table's time is never empty; without a NULLS clause its index gives the order, so a
        // page of a large table is read without sorting every row.
        const nulls = sortKey === spec.date ? '' : ' NULLS LAST';
        const cols = ['x.*'];
        const joins = [];
        if (spec.hasBoat) {
            cols.push('b.name AS _boat_name', 'b.fleet_number AS _boat_fleet');
            joins.push(`LEFT JOIN boats b ON b.club_id = x.club_id AND b.id = ${uid('x.boat_id')}`);
        }
        if (spec.hasMotor) {
            cols.push('mo.serial AS _motor_serial', 'mo.model AS _motor_model');
            joins.push(`LEFT JOIN motors mo ON mo.club_id = x.club_id AND mo.id = ${uid('x.motor_id')}`);
        }
        // Names come from the club's own memberships: an id from elsewhere shows no name.
        spec.people.forEach((f, i) => {
            cols.push(`${personAlias(i)}.display_name AS _p${i}`);
            joins.push(`LEFT JOIN memberships pm${i} ON pm${i}.club_id = x.club_id AND pm${i}.user_id = ${uid(`x.${snake(f)}`)}`
                + ` LEFT JOIN users ${personAlias(i)} ON ${personAlias(i)}.id = pm${i}.user_id`);
        });
        if (spec.kind === 'trip') {
            cols.push(`(SELECT coalesce(jsonb_agg(cu.display_name ORDER BY c.ord), '[]'::jsonb)
        FROM jsonb_array_elements_text(coalesce(x.crew_ids, '[]'::jsonb)) WITH ORDINALITY c(id, ord)
        LEFT JOIN memberships cm ON cm.club_id = x.club_id AND cm.user_id = ${uid('c.id')}
        LEFT JOIN users cu ON cu.id = cm.user_id) AS _crew_names`);
        }
        for (const [name, expr] of Object.entries(spec.extras))
            cols.push(`${expr} AS ${snake(name)}`);
        const from = `FROM ${tableName(table)} x`;
        const filter = `WHERE ${where.join(' AND ')}`;
        return {
            select: `SELECT ${cols.join(', ')} ${from} ${joins.join(' ')} ${filter} ORDER BY ${sortExpr} ${dir}${nulls}, x.id ${dir}`,
            count: `SELECT count(*)::int AS n ${from} ${filter}`,
            params,
            zone,
        };
    }
};
ReviewService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [DataSource])
], ReviewService);
export { ReviewService };
function toRow(spec, row) {
    const rec = rowToRecord(spec.kind, row);
    const out = { id: rec.id, version: rec.version, updatedAt: rec.updatedAt, ...rec.fields };
    if (spec.hasBoat) {
        out.boatName = row._boat_name ?? null;
        out.boatFleetNumber = row._boat_fleet ?? null;
    }
    if (spec.hasMotor)
        out.motorName = row._motor_serial ? `${String(row._motor_serial)} (${String(row._motor_model)})` : null;
    spec.people.forEach((f, i) => { out[nameKey(f)] = row[`_p${i}`] ?? null; });
    if (spec.kind === 'trip')
        out.crewNames = row._crew_names ?? [];
    for (const name of Object.keys(spec.extras)) {
        const v = row[snake(name)];
        out[name] = v === null || v === undefined ? null : Number(v);
    }
    return out;
}
//# sourceMappingURL=review.service.js.map