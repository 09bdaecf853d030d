import { deepEqual } from './deep-equal.js';
import { roleAtLeast, type Role } from './roles.js';

/** Which side's value a two-sided field keeps. */
export type Side = 'server' | 'incoming';

/** Both lists, current order first, then the incoming items not already there. */
export function unionLists(current: unknown, incoming: unknown): unknown[] {
  const out = Array.isArray(current) ? [...current] : [];
  for (const item of Array.isArray(incoming) ? incoming : []) {
    if (!out.some((x) => deepEqual(x, item))) out.push(item);
  }
  return out;
}

const OUTCOME_RANK: Record<string, number> = { fail: 3, pass: 2, na: 1 };
type ItemResult = { outcome?: string } & Record<string, unknown>;
type Results = Record<string, ItemResult>;

export interface ItemConflict {
  itemId: string;
  keptSide: Side;
  keptValue: unknown;
  overruledValue: unknown;
}

function asResults(v: unknown): Results {
  return typeof v === 'object' && v !== null && !Array.isArray(v) ? (v as Results) : {};
}

/**
 * Three-way merge of a check's results, item by item. An item only one side changed takes
 * that side. An item both changed keeps the worse outcome (fail > pass > n/a), because a
 * merge must never turn a reported fault into "fit". Equal outcomes that differ otherwise
 * (two different fails) go to the later clock. An item one side removed and the other
 * changed keeps the change. Every overruled item is reported, so nothing is lost.
 */
export function mergeCheckResults(base: unknown, current: unknown, incoming: unknown, incomingLater: boolean) {
  const b = asResults(base), c = asResults(current), p = asResults(incoming);
  const value: Results = { ...c };
  const conflicts: ItemConflict[] = [];
  for (const id of new Set([...Object.keys(c), ...Object.keys(p)])) {
    const [bi, ci, pi] = [b[id], c[id], p[id]];
    if (deepEqual(ci, bi)) {
      if (pi === undefined) delete value[id];
      else value[id] = pi;
      continue;
    }
    if (deepEqual(pi, bi) || deepEqual(pi, ci)) continue;
    let keep: Side;
    if (ci === undefined) keep = 'incoming';
    else if (pi === undefined) keep = 'server';
    else {
      const rc = OUTCOME_RANK[String(ci.outcome)] ?? 0, rp = OUTCOME_RANK[String(pi.outcome)] ?? 0;
      keep = rp > rc ? 'incoming' : rc > rp ? 'server' : incomingLater ? 'incoming' : 'server';
    }
    if (keep === 'incoming') value[id] = pi as ItemResult;
    const [kept, lost] = keep === 'incoming' ? [pi, ci] : [ci, pi];
    conflicts.push({ itemId: id, keptSide: keep, keptValue: kept ?? null, overruledValue: lost ?? null });
  }
  return { value, conflicts };
}

const CLOSED = new Set(['verified', 'rejected']);

/**
 * A defect's status when both sides changed it. Within the open side (open, assigned,
 * repaired) or within the closed side (verified, rejected) the later clock wins. Between an
 * open and a closing status, open wins unless the closing side is a supervisor or admin
 * whose change is the later one: "an open defect beats a closed one until a supervisor closes
 * it again". So a report or a reopening made while a supervisor's phone was offline is never
 * hidden by that older close, and a supervisor who closes after it still can. A side whose
 * role is unknown is taken as allowed: permission checks admit closing statuses from
 * supervisors only, so a stored closed status was written by one.
 */
export function resolveDefectStatus(
  current: unknown,
  incoming: unknown,
  incomingLater: boolean,
  currentRole: Role | undefined,
  incomingRole: Role | undefined,
): Side {
  const cClosed = CLOSED.has(String(current)), pClosed = CLOSED.has(String(incoming));
  if (cClosed === pClosed) return incomingLater ? 'incoming' : 'server';
  const closer: Side = pClosed ? 'incoming' : 'server';
  const closerRole = closer === 'incoming' ? incomingRole : currentRole;
  const closerLater = closer === 'incoming' ? incomingLater : !incomingLater;
  const closerMay = closerRole === undefined || roleAtLeast(closerRole, 'supervisor');
  const closedWins = closerLater && closerMay;
  return closedWins ? closer : closer === 'incoming' ? 'server' : 'incoming';
}
