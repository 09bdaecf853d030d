import { PULL_CHECKPOINT_HEADER, PULL_HAS_MORE_HEADER, roleAtLeast, SEE_RULES, type PullResponse, type Role } from '@breakline/sync-protocol';
import { clubRows } from '@/db/queries';
import { loadClubState, updateClubState } from '@/db/replica-state';
import type { ReplicaDb } from '@/db/schema';
import type { ClubSyncRow } from '@/db/types';
import { ApiError } from '@/lib/api-error';
import { applyPullPage } from './apply-page';
import type { ProgressListener } from './progress';
import { readJson, syncResponse, type TransportContext } from './transport';

/** A page of 1,000 is one IndexedDB transaction of about a quarter second on a phone. */
export const PULL_PAGE = 1000;

export const RESET_LOOP =
  'The server asked this phone to start its copy afresh twice in one sync. Changes stay on this phone; tell your club admin.';

export interface PullContext extends TransportContext {
  db: ReplicaDb;
  now: () => number;
  pageSize?: number;
  onProgress?: ProgressListener;
}

function isPullResponse(value: unknown): value is PullResponse {
  const v = value as PullResponse | null;
  return typeof v === 'object' && v !== null && Array.isArray(v.changes) && typeof v.checkpoint === 'string' && typeof v.hasMore === 'boolean';
}

/**
 * A reset keeps the rows on screen: it raises the generation and pulls from the start, and when
 * the last page lands, rows the new pull did not bring (and no queued edit holds) are swept.
 * Clearing first would show empty lists for the length of a full sync.
 */
async function startReset(db: ReplicaDb, clubId: string, view?: string): Promise<ClubSyncRow> {
  return db.transaction('rw', db.syncState, async () => {
    const state = await loadClubState(db, clubId);
    const gen = state.gen + 1;
    return updateClubState(db, clubId, { gen, sweepBelow: gen, checkpoint: undefined, ...(view === undefined ? {} : { view }) });
  });
}

/**
 * What a role sees of the club, as one string: the kinds of SEE_RULES it sees whole. Of the
 * others (other members' incident notes below driver) it gets only the person's own records.
 */
export function viewOf(role: Role): string {
  return Object.entries(SEE_RULES).filter(([, least]) => roleAtLeast(role, least)).map(([kind]) => kind).sort().join(',');
}

/**
 * A copy pulled under a role that saw other records starts afresh: pulls move the checkpoint past
 * what the role could not see, so a promoted member would never get those records, and a member
 * whose role was lowered would keep what they may no longer see (the reset's sweep removes it).
 */
async function matchView(db: ReplicaDb, clubId: string, role: Role): Promise<ClubSyncRow> {
  const view = viewOf(role);
  const state = await loadClubState(db, clubId);
  if (state.view === view) return state;
  // With nothing pulled yet, the view is simply this role's. A copy from before views were kept
  // starts afresh once too: the role it was pulled under is not known.
  return state.checkpoint === undefined ? updateClubState(db, clubId, { view }) : startReset(db, clubId, view);
}

interface Asked {
  /** Whether this request asked for the count of changes left (the first page of a pull). */
  counted: boolean;
  /** The checkpoint and hasMore the answer's headers give, once they arrive; null without them. */
  head: Promise<{ checkpoint: string; hasMore: boolean } | null>;
  page: Promise<PullResponse>;
}

/**
 * Pulls pages until the server has nothing more; each page and its checkpoint commit together.
 * The next page is asked for while this one is read and written: as soon as this answer's
 * headers give its checkpoint, or else once its body is read. So the server's work, the wire and
 * IndexedDB overlap instead of taking turns. The body is the authority: should its checkpoint
 * differ from the headers', the early request is dropped and the next page asked for again.
 */
export async function pullAll(ctx: PullContext): Promise<void> {
  const { db, scope } = ctx;
  const limit = ctx.pageSize ?? PULL_PAGE;
  const ask = (since: string | undefined, count = false): Asked => {
    const query = new URLSearchParams({ limit: String(limit) });
    if (since !== undefined) query.set('since', since);
    if (count) query.set('count', '1');
    const response = syncResponse(ctx, `/api/sync/pull?${query}`);
    const head = response.then((r) => {
      const checkpoint = r.ok ? r.headers.get(PULL_CHECKPOINT_HEADER) : null;
      const more = r.headers.get(PULL_HAS_MORE_HEADER);
      return checkpoint !== null && (more === 'true' || more === 'false') ? { checkpoint, hasMore: more === 'true' } : null;
    }, () => null);
    const page = response.then(async (r) => {
      const body = await readJson<unknown>(r);
      if (!isPullResponse(body)) throw new ApiError(200, 'bad_response', 'The server sent a pull answer Breakline cannot read.');
      return body;
    });
    // Should an early request be dropped, its failure is not anyone's to hear.
    page.catch(() => undefined);
    return { counted: count, head, page };
  };
  const start = await matchView(db, scope.clubId, scope.role);
  let since = start.checkpoint;
  // A first sync: no checkpoint and nothing of the club here yet (see applyPullPage).
  let fromEmpty = since === undefined && (await clubRows(db, scope.clubId).count()) === 0 ? { gen: start.gen } : undefined;
  let received = 0;
  let resets = 0;
  /** What this pull brings at most, from the count the first page asked for. */
  let total: number | undefined;
  let current = ask(since, true);
  for (;;) {
    const head = await current.head;
    let ahead = head?.hasMore ? { since: head.checkpoint, asked: ask(head.checkpoint) } : undefined;
    const page = await current.page;
    if (page.resetRequired) {
      // Asked again while already pulling afresh: going on would pull for ever.
      if (since === undefined || ++resets > 1) throw new ApiError(200, 'bad_response', RESET_LOOP);
      await startReset(db, scope.clubId);
      since = undefined;
      fromEmpty = undefined;
      current = ask(since, true);
      continue;
    }
    if (page.hasMore && ahead?.since !== page.checkpoint) ahead = { since: page.checkpoint, asked: ask(page.checkpoint) };
    since = page.checkpoint;
    await applyPullPage(db, scope.clubId, page, ctx.now(), { fromEmpty });
    received += page.changes.length;
    if (current.counted) {
      const left = page.remaining;
      total = typeof left === 'number' && Number.isSafeInteger(left) && left >= 0 ? received + left : undefined;
    }
    // Records changed during the pull may come on top of the count; the total never trails them.
    const counted = total !== undefined && page.hasMore ? { total: Math.max(total, received) } : {};
    ctx.onProgress?.({ phase: 'receiving', done: received, more: page.hasMore, ...counted });
    if (!page.hasMore) return;
    current = ahead!.asked;
  }
}
