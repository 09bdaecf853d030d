import { DEFECT_SEVERITIES, roleAtLeast, kindSpec, type Role } from '@breakline/sync-protocol';
import { CHECK_TYPE_WORDS, INCIDENT_WORDS, PURPOSE_WORDS } from './format';

/** The Review desk's tables, in the order of their tabs; each is a server list of one kind. */
export const DESK_TABS = ['checks', 'trips', 'defects', 'incidentNotes'] as const;
export type DeskTab = (typeof DESK_TABS)[number];

export const TAB_KIND = { checks: 'check', trips: 'trip', defects: 'defect', incidentNotes: 'incidentNote' } as const;
export const TAB_LABELS: Record<DeskTab, string> = {
  checks: 'Checks', trips: 'Trips', defects: 'Defects', incidentNotes: 'Incident notes',
};

/** The states a table can be narrowed to: what the server's `state` filter takes, and its words. */
export const STATE_OPTIONS: Record<DeskTab, readonly { value: string; label: string }[]> = {
  checks: [
    { value: 'in-progress', label: 'In progress' },
    { value: 'complete', label: 'Complete, not signed off' },
    { value: 'signed-off', label: 'Signed off' },
  ],
  trips: [
    { value: 'afloat', label: 'On the water' },
    { value: 'retrieved', label: 'Retrieved' },
  ],
  defects: [
    { value: 'unresolved', label: 'Not closed yet (open, assigned or repaired)' },
    { value: 'open', label: 'Open' },
    { value: 'assigned', label: 'Assigned' },
    { value: 'repaired', label: 'Repaired, to verify' },
    { value: 'verified', label: 'Verified' },
    { value: 'rejected', label: 'Rejected' },
  ],
  incidentNotes: [],
};

const options = (words: Record<string, string>) => Object.entries(words).map(([value, label]) => ({ value, label }));

/** The type filter: a check's type, a trip's purpose, an incident note's kind. */
export const TYPE_OPTIONS: Record<DeskTab, { label: string; options: readonly { value: string; label: string }[] } | null> = {
  checks: { label: 'Check', options: options(CHECK_TYPE_WORDS) },
  trips: { label: 'Purpose', options: options(PURPOSE_WORDS) },
  defects: null,
  incidentNotes: { label: 'What happened', options: options(INCIDENT_WORDS) },
};

/** Only defects have a severity. */
export const SEVERITY_OPTIONS: readonly { value: string; label: string }[] = DEFECT_SEVERITIES.map((s) => ({
  value: s, label: s === 'stand-down' ? 'Stand-down' : s === 'limit' ? 'Limit' : 'Note',
}));

export const PAGE_SIZES = [25, 50, 100] as const;
export const DEFAULT_PAGE_SIZE = 50;

export interface DeskFilters {
  /** Local calendar dates at the club, inclusive. */
  from?: string;
  to?: string;
  boatId?: string;
  motorId?: string;
  memberId?: string;
  state?: string;
  severity?: string;
  type?: string;
}

export interface DeskQuery extends DeskFilters {
  tab: DeskTab;
  sort?: string;
  dir?: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

const FILTER_KEYS = ['from', 'to', 'boatId', 'motorId', 'memberId', 'state', 'severity', 'type'] as const;
const DATE = /^\d{4}-\d{2}-\d{2}$/;

/** Who may open a tab: incident notes hold health information and follow the kind's own rule. */
export function tabsFor(role: Role): DeskTab[] {
  const see = kindSpec('incidentNote').access.see ?? 'crew';
  return DESK_TABS.filter((t) => t !== 'incidentNotes' || roleAtLeast(role, see));
}

/** The desk's state lives in the address, so Back from a record returns to the same page of the same table. */
export function parseDeskQuery(search: URLSearchParams, allowed: readonly DeskTab[] = DESK_TABS): DeskQuery {
  const tabParam = search.get('tab');
  const tab = allowed.find((t) => t === tabParam) ?? allowed[0] ?? 'checks';
  const q: DeskQuery = { tab, page: 0, pageSize: DEFAULT_PAGE_SIZE };
  for (const key of FILTER_KEYS) {
    const value = search.get(key)?.trim();
    if (!value) continue;
    if ((key === 'from' || key === 'to') && !DATE.test(value)) continue;
    if (key === 'state' && !STATE_OPTIONS[tab].some((o) => o.value === value)) continue;
    if (key === 'severity' && (tab !== 'defects' || !SEVERITY_OPTIONS.some((o) => o.value === value))) continue;
    if (key === 'type' && !TYPE_OPTIONS[tab]?.options.some((o) => o.value === value)) continue;
    q[key] = value;
  }
  const sort = search.get('sort');
  if (sort && /^[A-Za-z]{1,40}$/.test(sort)) {
    q.sort = sort;
    q.dir = search.get('dir') === 'asc' ? 'asc' : 'desc';
  }
  const page = Number(search.get('page'));
  if (Number.isInteger(page) && page > 0) q.page = page;
  const size = Number(search.get('pageSize'));
  if ((PAGE_SIZES as readonly number[]).includes(size)) q.pageSize = size;
  return q;
}

/** The address form of a query; defaults are left out so links stay short. */
export function deskSearch(q: DeskQuery): URLSearchParams {
  const out = new URLSearchParams({ tab: q.tab });
  for (const key of FILTER_KEYS) if (q[key]) out.set(key, q[key]!);
  if (q.sort) {
    out.set('sort', q.sort);
    out.set('dir', q.dir ?? 'desc');
  }
  if (q.page > 0) out.set('page', String(q.page));
  if (q.pageSize !== DEFAULT_PAGE_SIZE) out.set('pageSize', String(q.pageSize));
  return out;
}

/** A filter changed: back to the first page, and drop filters the new tab does not have. */
export function withFilters(q: DeskQuery, change: Partial<DeskFilters>): DeskQuery {
  const next: DeskQuery = { ...q, ...change, page: 0 };
  for (const key of FILTER_KEYS) if (!next[key]) delete next[key];
  return next;
}

export function withTab(q: DeskQuery, tab: DeskTab): DeskQuery {
  const { state: _state, severity: _severity, type: _type, sort: _sort, dir: _dir, ...rest } = q;
  return { ...rest, tab, page: 0 };
}

function apiParams(q: DeskQuery, paged: boolean): string {
  const p = new URLSearchParams();
  for (const key of FILTER_KEYS) if (q[key]) p.set(key, q[key]!);
  if (q.sort) {
    p.set('sort', q.sort);
    p.set('dir', q.dir ?? 'desc');
  }
  if (paged) {
    p.set('page', String(q.page));
    p.set('pageSize', String(q.pageSize));
  }
  return p.toString();
}

/** The server's page of the table. */
export function listPath(q: DeskQuery): string {
  return `/api/review/${q.tab}?${apiParams(q, true)}`;
}

/** The whole filtered table as CSV: the same filters and order, every page. */
export function csvPath(q: DeskQuery): string {
  const params = apiParams(q, false);
  return `/api/review/${q.tab}.csv${params ? `?${params}` : ''}`;
}

/** The filters in words, for the CSV file's name and the empty table's message. */
export function hasFilters(q: DeskFilters): boolean {
  return FILTER_KEYS.some((k) => Boolean(q[k]));
}

export function dateRangeProblem(q: DeskFilters): string | null {
  return q.from && q.to && q.from > q.to ? 'The "from" date is after the "to" date: swap them or clear one.' : null;
}
