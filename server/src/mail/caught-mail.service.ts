import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';

export interface CaughtMailDto { id: string; to: string[]; subject: string; text: string; at: string; tag: string | null }

const MAX = 200;

/**
 * Reads what the local mail catcher caught (MAIL_CAUGHT_DIR), for the admin's caught-mail page.
 * An admin sees only mail addressed to their own club's members and invitees.
 */
@Injectable()
export class CaughtMailService {
  constructor(private readonly env: Env, private readonly db: DataSource) {}

  get on(): boolean {
    return Boolean(this.env.MAIL_CAUGHT_DIR);
  }

  async list(clubId: string): Promise<CaughtMailDto[]> {
    const dir = this.env.MAIL_CAUGHT_DIR;
    if (!dir) throw new AppError(404, 'not_found', 'The caught-mail page is on only while the local mail catcher runs (npm start or npm test); this server sends real e-mail.');
    const names = (await readdir(dir).catch(() => [] as string[])).filter((n) => n.endsWith('.json')).sort().reverse();
    const people = await this.clubAddresses(clubId);
    const out: CaughtMailDto[] = [];
    for (const name of names) {
      if (out.length >= MAX) break;
      const m = await readFile(join(dir, name), 'utf8').then((s) => JSON.parse(s) as Partial<CaughtMailDto>, () => null);
      if (!m || !Array.isArray(m.to) || !m.to.some((a) => people.has(String(a).toLowerCase()))) continue;
      out.push({ id: String(m.id ?? name.replace(/\.json$/, '')), to: m.to.map(String), subject: String(m.subject ?? ''), text: String(m.text ?? ''), at: String(m.at ?? ''), tag: m.tag ?? null });
    }
    return out;
  }

  private async clubAddresses(clubId: string): Promise<Set<string>> {
    const rows: { email: string }[] = await this.db.query(
      `SELECT u.email FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.club_id = $1
       UNION SELECT email FROM invites WHERE club_id = $1`, [clubId]);
    return new Set(rows.map((r) => r.email.toLowerCase()));
  }
}
