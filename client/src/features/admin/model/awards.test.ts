import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { awardCsvRows, awardRows, fromDrafts } from './awards';

const card = (id: string, displayName: string, awards: { name: string; expiresOn: string | null; qualifies?: 'driver' | 'crew' }[]) => ({
  id, fields: { memberId: `u-${id}`, displayName, awards: awards.map((a, i) => ({ id: `a${i}`, name: a.name, qualifies: a.qualifies ?? 'crew' as const, awardedOn: '2025-01-01', expiresOn: a.expiresOn })) },
});

describe('crew awards model', () => {
  it('puts what needs action first, and counts the expiry day itself as valid', () => {
    // Rule of the brief: warn 30 days before an award lapses; valid through its expiry date (sync-protocol awardStatusOn).
    const rows = awardRows([
      card('1', 'Ana', [{ name: 'Crew', expiresOn: '2027-06-30' }]),
      card('2', 'Ben', [{ name: 'Crew', expiresOn: '2026-12-06' }]),
      card('3', 'Cai', [{ name: 'Crew', expiresOn: '2026-12-05' }]),
      card('4', 'Dee', [{ name: 'Crew', expiresOn: '2027-01-05' }]),
      card('5', 'Eli', [{ name: 'Crew', expiresOn: '2027-01-06' }]),
    ], '2026-12-06');
    expect(rows.map((r) => [r.member, r.status, r.daysLeft])).toEqual([
      ['Cai', 'expired', -1], ['Ben', 'lapsing', 0], ['Dee', 'lapsing', 30], ['Eli', 'current', 31], ['Ana', 'current', 206],
    ]);
  });

  it('writes the list as CSV a spreadsheet opens, one line an award', () => {
    const csv = Papa.unparse(awardCsvRows(awardRows([card('1', 'Ana, the captain', [{ name: 'Crew', expiresOn: null }])], '2026-12-06')));
    expect(Papa.parse(csv, { header: true }).data).toEqual([
      { member: 'Ana, the captain', award: 'Crew', qualifies: 'crew', awardedOn: '2025-01-01', expiresOn: '', state: 'Current', daysLeft: '' },
    ]);
  });

  it('refuses an award that expires before it was awarded', () => {
    expect(fromDrafts([{ id: 'a', name: 'Driver', qualifies: 'driver', awardedOn: '2026-05-01', expiresOn: '2026-04-30' }]))
      .toEqual({ ok: false, message: '"Driver" expires before it was awarded: check the dates.' });
  });
});
