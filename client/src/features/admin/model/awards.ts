import { awardStatusOn, currencyForRole, type AwardCurrency, type MemberAward } from '@breakline/sync-protocol';

export interface AwardRow {
  cardId: string;
  memberId: string;
  member: string;
  award: MemberAward | null;
  status: AwardCurrency | 'none';
  daysLeft: number | null;
  reason: string;
}

export interface CardSummary {
  cardId: string;
  memberId: string;
  member: string;
  driver: ReturnType<typeof currencyForRole>;
  crew: ReturnType<typeof currencyForRole>;
}

/** Worst first: what a supervisor must act on comes to the top. */
const RANK: Record<AwardRow['status'], number> = { expired: 0, lapsing: 1, 'not-yet-held': 2, none: 3, current: 4 };

export const STATUS_WORDS: Record<AwardRow['status'], string> = {
  current: 'Current', lapsing: 'Lapsing', expired: 'Expired', 'not-yet-held': 'Not yet held', none: 'No award recorded',
};

interface Card { id: string; fields: { memberId: string; displayName: string; awards: MemberAward[] } }

/** One row an award (one row a member without any), with its state on `date` (the club's local date). */
export function awardRows(cards: readonly Card[], date: string): AwardRow[] {
  const rows = cards.flatMap((c): AwardRow[] => {
    const base = { cardId: c.id, memberId: c.fields.memberId, member: c.fields.displayName };
    if (c.fields.awards.length === 0) return [{ ...base, award: null, status: 'none', daysLeft: null, reason: 'No award recorded on the member card.' }];
    return c.fields.awards.map((a) => {
      const s = awardStatusOn(a, date);
      return { ...base, award: a, status: s.status, daysLeft: s.daysLeft, reason: s.reason };
    });
  });
  return rows.sort((a, b) =>
    RANK[a.status] - RANK[b.status] || (a.daysLeft ?? Infinity) - (b.daysLeft ?? Infinity) || a.member.localeCompare(b.member));
}

export function cardSummaries(cards: readonly Card[], date: string): CardSummary[] {
  return cards.map((c) => ({
    cardId: c.id, memberId: c.fields.memberId, member: c.fields.displayName,
    driver: currencyForRole(c.fields.awards, 'driver', date),
    crew: currencyForRole(c.fields.awards, 'crew', date),
  })).sort((a, b) => a.member.localeCompare(b.member));
}

export function countByStatus(rows: readonly AwardRow[]): Record<AwardRow['status'], number> {
  const out = { current: 0, lapsing: 0, expired: 0, 'not-yet-held': 0, none: 0 };
  for (const r of rows) out[r.status] += 1;
  return out;
}

/** The list as a spreadsheet: one line an award, dates as ISO 8601. */
export function awardCsvRows(rows: readonly AwardRow[]) {
  return rows.map((r) => ({
    member: r.member,
    award: r.award?.name ?? '',
    qualifies: r.award?.qualifies ?? '',
    awardedOn: r.award?.awardedOn ?? '',
    expiresOn: r.award?.expiresOn ?? '',
    state: STATUS_WORDS[r.status],
    daysLeft: r.daysLeft ?? '',
  }));
}

export interface AwardDraft {
  id: string;
  name: string;
  qualifies: 'driver' | 'crew';
  awardedOn: string;
  expiresOn: string;
}

export const toDraft = (a: MemberAward): AwardDraft => ({ id: a.id, name: a.name, qualifies: a.qualifies, awardedOn: a.awardedOn ?? '', expiresOn: a.expiresOn ?? '' });

/** The drafts as awards, or the first thing wrong with them in words. */
export function fromDrafts(drafts: readonly AwardDraft[]): { ok: true; awards: MemberAward[] } | { ok: false; message: string } {
  const awards: MemberAward[] = [];
  for (const [i, d] of drafts.entries()) {
    const name = d.name.trim();
    const which = name ? `"${name}"` : `Award ${i + 1}`;
    if (!name) return { ok: false, message: `${which} needs a name, such as the award's title on the certificate.` };
    if (d.expiresOn && d.awardedOn && d.expiresOn < d.awardedOn) return { ok: false, message: `${which} expires before it was awarded: check the dates.` };
    awards.push({ id: d.id, name, qualifies: d.qualifies, awardedOn: d.awardedOn || null, expiresOn: d.expiresOn || null });
  }
  return { ok: true, awards };
}
