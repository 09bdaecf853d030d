import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { IsNull, Repository } from 'typeorm';
import { isUUID } from 'class-validator';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';
import { RefreshToken } from './refresh-token.entity.js';

const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');
const refused = () => new AppError(401, 'unauthorized', 'This sign-in has ended. Sign in again.');

/** Issues, rotates and revokes refresh tokens of the form `<id>.<secret>`. */
@Injectable()
export class RefreshTokensService {
  constructor(@InjectRepository(RefreshToken) private readonly repo: Repository<RefreshToken>, private readonly env: Env) {}

  async issue(userId: string, clubId: string, familyId?: string): Promise<string> {
    const secret = randomBytes(32).toString('base64url');
    const row = await this.repo.save(this.repo.create({
      userId, clubId, familyId: familyId ?? crypto.randomUUID(), secretHash: sha256(secret),
      expiresAt: new Date(Date.now() + this.env.REFRESH_TOKEN_TTL_DAYS * 86_400_000), revokedAt: null,
    }));
    return `${row.id}.${secret}`;
  }

  /** Spends a token: it is revoked and its successor returned. A spent token shown again ends the family. */
  async rotate(token: string): Promise<{ userId: string; clubId: string; next: (clubId?: string) => Promise<string> }> {
    const row = await this.find(token);
    if (row.revokedAt) {
      await this.repo.update({ familyId: row.familyId, revokedAt: IsNull() }, { revokedAt: new Date() });
      throw refused();
    }
    if (row.expiresAt.getTime() <= Date.now()) throw refused();
    const res = await this.repo.update({ id: row.id, revokedAt: IsNull() }, { revokedAt: new Date() });
    if (!res.affected) throw refused(); // spent by a concurrent request
    return { userId: row.userId, clubId: row.clubId, next: (clubId) => this.issue(row.userId, clubId ?? row.clubId, row.familyId) };
  }

  async revoke(token: string): Promise<void> {
    const row = await this.find(token).catch(() => null);
    if (row) await this.repo.update({ familyId: row.familyId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }

  private async find(token: string): Promise<RefreshToken> {
    const [id, secret] = token.split('.');
    if (!id || !secret || !isUUID(id)) throw refused();
    const row = await this.repo.findOne({ where: { id } });
    if (!row) throw refused();
    const a = Buffer.from(row.secretHash, 'hex');
    const b = Buffer.from(sha256(secret), 'hex');
    if (a.length !== b.length || !timingSafeEqual(a, b)) throw refused();
    return row;
  }
}
