import { HybridClock } from '../hybrid-clock.js';
import { canSee } from '../permissions.js';
import { parsePushRequest, PullQuerySchema } from '../wire-schemas.js';
import { formatCheckpoint, needsFreshStart, parseCheckpoint } from '../wire-checkpoint.js';
import { PROTOCOL_VERSION } from '../wire.js';
import type { ConflictRecord, MutationError, MutationResult, PullResponse, PushResponse, SettleRequest, SyncRecord } from '../wire.js';
import { cloneJson } from '../deep-equal.js';
import { applyMutation } from '../apply/apply-mutation.js';
import { settleConflict } from '../apply/settle.js';
import { counterIds, emptyClub, SyncRequestError, toWire, type AuthContext, type ClubState } from '../apply/club-state.js';

export interface MemoryServerOptions {
  /** Id maker for conflicts; deterministic by default. */
  newId?: () => string;
}

function checkProtocol(version: unknown): void {
  if (version !== PROTOCOL_VERSION) {
    throw new SyncRequestError(426, 'This app is out of date. It will update itself; then sync again.');
  }
}

/**
 * The sync server's rules without a database: for tests of the protocol and of clients.
 * Each call takes the server's physical time `pt` (ms), so runs are deterministic. A push
 * works on a copy of the club and commits it at the end: one transaction a batch.
 */
export class MemorySyncServer {
  private clubs = new Map<string, ClubState>();
  private readonly clock = new HybridClock('server');
  private readonly newId: () => string;
  /** Refused changes by club and mutation id: a replay of one is refused again, as on the server. */
  private readonly refusals = new Map<string, MutationError>();

  constructor(options: MemoryServerOptions = {}) {
    this.newId = options.newId ?? counterIds();
  }

  private club(clubId: string): ClubState {
    let c = this.clubs.get(clubId);
    if (!c) this.clubs.set(clubId, (c = emptyClub()));
    return c;
  }

  push(auth: AuthContext, body: unknown, pt: number): PushResponse {
    if (typeof body !== 'object' || body === null) throw new SyncRequestError(400, 'Malformed push: expected a JSON object.');
    checkProtocol((body as { protocolVersion?: unknown } | null)?.protocolVersion);
    const parsed = parsePushRequest(body);
    if (!parsed.success) throw new SyncRequestError(400, `Malformed push: ${parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ')}`);
    const { deviceId, mutations } = parsed.data;
    const club = cloneJson(this.club(auth.clubId));
    const results: MutationResult[] = [];
    const ctx = { club, auth, deviceId, pt, clock: this.clock, newId: this.newId, validated: new Map() };
    for (const m of mutations) {
      const last = club.deviceSeq[deviceId] ?? 0;
      if (m.seq <= last) {
        const error = this.refusals.get(`${auth.clubId} ${m.mutationId}`);
        if (error) {
          results.push({ mutationId: m.mutationId, status: 'rejected', error });
          continue;
        }
        const rec = club.records[m.recordId];
        results.push({ mutationId: m.mutationId, status: 'duplicate', ...(rec ? { version: rec.version } : {}) });
        continue;
      }
      results.push(applyMutation(ctx, m));
      club.deviceSeq[deviceId] = m.seq;
    }
    this.clubs.set(auth.clubId, club);
    for (const r of results) if (r.status === 'rejected' && r.error) this.refusals.set(`${auth.clubId} ${r.mutationId}`, r.error);
    return { results, lastSeq: club.deviceSeq[deviceId] ?? 0 };
  }

  /** Changes after `since` the caller may see, oldest first; the checkpoint passes hidden ones too. */
  pull(auth: AuthContext, query: { since?: string; limit?: number | string; count?: string } = {}): PullResponse {
    const q = PullQuerySchema.safeParse(query);
    if (!q.success) throw new SyncRequestError(400, `Malformed pull: ${q.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ')}`);
    const club = this.club(auth.clubId);
    const horizon = club.purgedThrough;
    const since = parseCheckpoint(q.data.since);
    // A replica that pulled before purged tombstones may hold records that are gone.
    if (needsFreshStart(since, horizon, club.changeSeq)) return { changes: [], checkpoint: formatCheckpoint({ horizon, seq: club.changeSeq }), hasMore: false, resetRequired: true };
    const after = Object.values(club.records).filter((r) => r.changeSeq > since.seq).sort((a, b) => a.changeSeq - b.changeSeq);
    const changes: SyncRecord[] = [];
    let checkpoint = since.seq;
    let i = 0;
    for (; i < after.length && changes.length < q.data.limit; i++) {
      const r = after[i]!;
      checkpoint = r.changeSeq;
      if (canSee(r.kind, auth.role, r.fields, auth.userId)) changes.push(toWire(r));
    }
    const page: PullResponse = { changes, checkpoint: formatCheckpoint({ horizon, seq: checkpoint }), hasMore: i < after.length };
    if (q.data.count === '1') page.remaining = after.length - i;
    return page;
  }

  settle(auth: AuthContext, body: SettleRequest, pt: number): ConflictRecord {
    checkProtocol(body?.protocolVersion);
    const club = cloneJson(this.club(auth.clubId));
    const settled = settleConflict({ club, auth, pt, clock: this.clock }, body);
    this.clubs.set(auth.clubId, club);
    return settled;
  }

  /**
   * Drop tombstones changed at or before `throughSeq`. The horizon moves to the newest change
   * dropped, as on the real server; a replica that pulled below it before the purge must start afresh.
   */
  purgeTombstones(clubId: string, throughSeq: number): number {
    const club = this.club(clubId);
    const gone = Object.values(club.records).filter((r) => r.deleted && r.changeSeq <= throughSeq);
    for (const r of gone) {
      delete club.records[r.id];
      club.purgedThrough = Math.max(club.purgedThrough, r.changeSeq);
    }
    return gone.length;
  }

  records(clubId: string): SyncRecord[] {
    return Object.values(this.club(clubId).records).map(toWire);
  }

  record(clubId: string, id: string): SyncRecord | undefined {
    const r = this.club(clubId).records[id];
    return r ? toWire(r) : undefined;
  }

  conflicts(clubId: string): ConflictRecord[] {
    return cloneJson(this.club(clubId).conflicts);
  }

  lastSeq(clubId: string, deviceId: string): number {
    return this.club(clubId).deviceSeq[deviceId] ?? 0;
  }
}
