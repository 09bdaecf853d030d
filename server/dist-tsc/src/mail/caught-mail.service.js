var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';
const MAX = 200;
/**
 * Reads what the local mail catcher caught (MAIL_CAUGHT_DIR), for the admin's caught-mail page.
 * An admin sees only mail addressed to their own club's members and invitees.
 */
let CaughtMailService = class CaughtMailService {
    env;
    db;
    constructor(env, db) {
        this.env = env;
        this.db = db;
    }
    get on() {
        return Boolean(this.env.MAIL_CAUGHT_DIR);
    }
    async list(clubId) {
        const dir = this.env.MAIL_CAUGHT_DIR;
        if (!dir)
            throw new AppError(404, 'not_found', 'The caught-mail page is on only while the local mail catcher runs (npm start or npm test); this server sends real e-mail.');
        const names = (await readdir(dir).catch(() => [])).filter((n) => n.endsWith('.json')).sort().reverse();
        const people = await this.clubAddresses(clubId);
        const out = [];
        for (const name of names) {
            if (out.length >= MAX)
                break;
            const m = await readFile(join(dir, name), 'utf8').then((s) => JSON.parse(s), () => null);
            if (!m || !Array.isArray(m.to) || !m.to.some((a) => people.has(String(a).toLowerCase())))
                continue;
            out.push({ id: String(m.id ?? name.replace(/\.json$/, '')), to: m.to.map(String), subject: String(m.subject ?? ''), text: String(m.text ?? ''), at: String(m.at ?? ''), tag: m.tag ?? null });
        }
        return out;
    }
    async clubAddresses(clubId) {
        const rows = await this.db.query(`SELECT u.email FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.club_id = $1
       UNION SELECT email FROM invites WHERE club_id = $1`, [clubId]);
        return new Set(rows.map((r) => r.email.toLowerCase()));
    }
};
CaughtMailService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [Env, DataSource])
], CaughtMailService);
export { CaughtMailService };
//# sourceMappingURL=caught-mail.service.js.map