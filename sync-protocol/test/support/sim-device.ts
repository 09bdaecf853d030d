import {
  HybridClock, buildMutation, decodeHlc, encodeHlc, overlayPending,
  type AuthContext, type Fields, type LocalView, type Mutation, type MutationResult, type PullResponse,
  type PushResponse, type RecordKind, type SyncRecord,
} from '../../src/index.js';

interface OutboxEntry {
  mutation: Mutation;
  /** Acknowledged entries stay on top until a pull brings the version they produced. */
  ackVersion?: number;
}

/** What a device needs of a server; the simulation wraps the memory server in this. */
export interface SimTransport {
  push(auth: AuthContext, body: unknown, pt: number): PushResponse;
  pull(auth: AuthContext, query: { since?: string; limit?: number }): PullResponse;
}

/** A phone: a replica of what the server sent, an outbox, and its own clock running `offsetMs` off. */
export class SimDevice {
  readonly clock: HybridClock;
  private shadow = new Map<string, SyncRecord>();
  private kinds = new Map<string, RecordKind>();
  private outbox: OutboxEntry[] = [];
  private checkpoint: string | undefined;
  private seq = 0;
  private ids = 0;

  constructor(readonly id: string, readonly auth: AuthContext, readonly offsetMs: number, private readonly n: number) {
    this.clock = new HybridClock(id);
  }

  private overlays(recordId: string): Mutation[] {
    const version = this.shadow.get(recordId)?.version ?? 0;
    return this.outbox
      .filter((e) => e.mutation.recordId === recordId && (e.ackVersion === undefined || version < e.ackVersion))
      .map((e) => e.mutation);
  }

  view(recordId: string): LocalView | undefined {
    const kind = this.kinds.get(recordId);
    if (!kind) return undefined;
    const pending = this.overlays(recordId).map((m) => ({ patch: m.patch, deleted: m.deleted }));
    return overlayPending(recordId, kind, this.shadow.get(recordId), pending);
  }

  /** Records the device shows (not deleted), in a stable order. */
  visible(kind?: RecordKind): LocalView[] {
    return [...this.kinds.keys()].sort().map((id) => this.view(id)).filter((v): v is LocalView => !!v && !v.deleted && (!kind || v.kind === kind));
  }

  pendingCount(): number {
    return this.outbox.filter((e) => e.ackVersion === undefined).length;
  }

  newRecordId(): string {
    this.ids += 1;
    return `${this.n.toString(16).padStart(8, '0')}-0000-7000-8000-${this.ids.toString(16).padStart(12, '0')}`;
  }

  /** Record a local change: it shows at once and waits in the outbox. */
  write(kind: RecordKind, recordId: string, patch: Fields, globalPt: number, deleted = false): Mutation {
    this.seq += 1;
    const m = buildMutation({
      mutationId: `${this.n.toString(16).padStart(8, '0')}-0000-7000-9000-${this.seq.toString(16).padStart(12, '0')}`,
      seq: this.seq,
      hlc: encodeHlc(this.clock.now(globalPt + this.offsetMs)),
      view: this.view(recordId),
      kind,
      recordId,
      patch,
      deleted,
    });
    this.kinds.set(recordId, kind);
    this.outbox.push({ mutation: m });
    return m;
  }

  /** Send up to `max` queued changes; with `drop` the server acts but the answer never arrives. */
  push(server: SimTransport, globalPt: number, max: number, drop: boolean): PushResponse | undefined {
    const batch = this.outbox.filter((e) => e.ackVersion === undefined).slice(0, max).map((e) => e.mutation);
    if (batch.length === 0) return undefined;
    const res = server.push(this.auth, { protocolVersion: 1, deviceId: this.id, mutations: batch }, globalPt);
    if (!drop) this.acknowledge(res.results);
    return res;
  }

  private acknowledge(results: readonly MutationResult[]): void {
    for (const r of results) {
      const i = this.outbox.findIndex((e) => e.mutation.mutationId === r.mutationId);
      if (i < 0) continue;
      if (r.status === 'rejected' || r.version === undefined) this.outbox.splice(i, 1);
      else this.outbox[i]!.ackVersion = r.version;
    }
    this.prune();
  }

  private prune(): void {
    this.outbox = this.outbox.filter((e) => e.ackVersion === undefined || (this.shadow.get(e.mutation.recordId)?.version ?? 0) < e.ackVersion);
  }

  /** One page of changes; returns whether there is more. */
  pull(server: SimTransport, globalPt: number, limit: number, drop: boolean): boolean {
    const res = server.pull(this.auth, { since: this.checkpoint, limit });
    if (drop) return res.hasMore;
    for (const rec of res.changes) {
      this.shadow.set(rec.id, rec);
      this.kinds.set(rec.id, rec.kind);
      this.clock.receive(decodeHlc(rec.hlc), globalPt + this.offsetMs);
    }
    this.checkpoint = res.checkpoint;
    this.prune();
    return res.hasMore;
  }

  /** Push everything, then pull to the end, with nothing dropped. */
  syncFully(server: SimTransport, globalPt: number): void {
    while (this.push(server, globalPt, 3, false)) {
      /* keep sending */
    }
    while (this.pull(server, globalPt, 4, false)) {
      /* keep fetching */
    }
  }

  /** Every queued or acknowledged change still shown on top of the replica. */
  outboxEntries(): readonly OutboxEntry[] {
    return this.outbox;
  }
}
