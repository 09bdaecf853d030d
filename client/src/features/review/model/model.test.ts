import { describe, expect, it } from 'vitest';
import { csvPath, deskSearch, listPath, parseDeskQuery, tabsFor, withFilters, withTab } from './desk-query';
import { deviceText, hlcTime, tableTime } from './format';
import { parseDraft, valueShape } from './third-value';
import { expandChanges, valueText, type ValueContext } from './values';

const ctx: ValueContext = {
  zone: 'Australia/Sydney', boat: (id) => `boat ${String(id)}`, motor: (id) => `motor ${String(id)}`, member: (id) => `member ${String(id)}`,
  itemLabel: (id) => ({ bung: 'Hull: drain bung in and tight' })[id],
};

describe('the desk query in the address', () => {
  it('keeps what the table can use and drops what it cannot, so a hand-edited link still opens', () => {
    const q = parseDeskQuery(new URLSearchParams('tab=defects&from=2026-11-01&to=1/12/2026&state=verified&severity=loud&type=x&sort=reportedAt;drop&page=-2&pageSize=7'));
    expect(q).toEqual({ tab: 'defects', from: '2026-11-01', state: 'verified', page: 0, pageSize: 50 });
    expect(parseDeskQuery(new URLSearchParams('tab=trips&state=verified')).state).toBeUndefined();
    expect(parseDeskQuery(new URLSearchParams('tab=nonsense')).tab).toBe('checks');
  });

  it('asks the server for a page and for the CSV with the same filters and order', () => {
    const q = parseDeskQuery(new URLSearchParams('tab=trips&boatId=b-1&type=rescue&sort=launchedAt&dir=asc&page=2&pageSize=25'));
    expect(listPath(q)).toBe('/api/review/trips?boatId=b-1&type=rescue&sort=launchedAt&dir=asc&page=2&pageSize=25');
    expect(csvPath(q)).toBe('/api/review/trips.csv?boatId=b-1&type=rescue&sort=launchedAt&dir=asc');
    expect(deskSearch(q).toString()).toBe('tab=trips&boatId=b-1&type=rescue&sort=launchedAt&dir=asc&page=2&pageSize=25');
  });

  it('goes back to the first page when a filter changes, and drops filters another table lacks', () => {
    const q = parseDeskQuery(new URLSearchParams('tab=defects&severity=limit&state=open&page=4&boatId=b-1'));
    expect(withFilters(q, { memberId: 'u-1' })).toMatchObject({ page: 0, memberId: 'u-1', severity: 'limit' });
    expect(withTab(q, 'checks')).toEqual({ tab: 'checks', boatId: 'b-1', page: 0, pageSize: 50 });
  });

  it('opens the incident notes tab only to roles that may see others\' notes (drivers and up, by the kind\'s rule)', () => {
    expect(tabsFor('crew')).toEqual(['checks', 'trips', 'defects']);
    expect(tabsFor('supervisor')).toEqual(['checks', 'trips', 'defects', 'incidentNotes']);
  });
});

describe('values in words', () => {
  it('splits a change of check results into one line an item, named from the template', () => {
    const lines = expandChanges({ results: { from: { hull: { outcome: 'pass' }, bung: { outcome: 'pass' } }, to: { hull: { outcome: 'pass' }, bung: { outcome: 'fail', note: 'Cracked' } } } });
    expect(lines).toEqual([{ field: 'results.bung', from: { outcome: 'pass' }, to: { outcome: 'fail', note: 'Cracked' } }]);
    expect(valueText('check', 'results.bung', lines[0]!.to, ctx)).toBe('Failed · “Cracked”');
  });

  it('names people, boats and states, and prints times at the club', () => {
    expect(valueText('defect', 'assignedTo', 'u-7', ctx)).toBe('member u-7');
    expect(valueText('trip', 'crewIds', ['u-1', 'u-2'], ctx)).toBe('member u-1, member u-2');
    expect(valueText('defect', 'status', 'repaired', ctx)).toBe('Repaired, to verify');
    expect(valueText('check', 'deleted', true, ctx)).toBe('Deleted');
    // 2026-12-05T20:26Z is 07:26 on the 6th in Sydney (UTC+11 from 4 Oct 2026, IANA tz database 2026c).
    expect(valueText('defect', 'reportedAt', '2026-12-05T20:26:00Z', ctx)).toBe('Sun, 6 Dec 2026, 07:26');
    expect(tableTime('2026-12-05T20:26:00Z', 'Australia/Sydney', new Date('2026-12-06T00:00:00Z'))).toBe('Sun 6 Dec, 07:26');
    expect(tableTime('2026-12-05T20:26:00Z', 'Australia/Sydney', new Date('2027-02-01T00:00:00Z'))).toBe('Sun 6 Dec 2026, 07:26');
  });

  it('reads a conflict side\'s time from its clock stamp and names devices a person can tell apart', () => {
    expect(hlcTime('001796515260000-00003-0193aa00-0000-7000-8000-00000000a4f1', 'Australia/Sydney')).toBe('Sun, 6 Dec 2026, 11:01:00');
    expect(hlcTime('not a stamp', 'Australia/Sydney')).toBe('time unknown');
    expect(deviceText('0193aa00-0000-7000-8000-00000000a4f1', undefined)).toBe('device ending 00a4f1');
    expect(deviceText('0193aa00-0000-7000-8000-00000000a4f1', '0193aa00-0000-7000-8000-00000000a4f1')).toBe('this computer');
    expect(deviceText('server', undefined)).toBe('the Review desk');
    expect(deviceText('member-cards', undefined)).toBe('the server (member-cards)');
  });
});

describe('a third value typed at the desk', () => {
  it('is read by the kind of value in conflict, and says what is wrong in words', () => {
    expect(valueShape('notes', 'a', 'b')).toBe('text');
    expect(valueShape('engineHoursEnd', 12.5, null)).toBe('number');
    expect(valueShape('inService', true, false)).toBe('yes-no');
    expect(valueShape('results.bung', { outcome: 'pass' }, { outcome: 'fail' })).toBe('item-result');
    expect(parseDraft('number', '12,5')).toEqual({ ok: true, value: 12.5 });
    expect(parseDraft('number', 'twelve')).toEqual({ ok: false, message: 'Type a number, such as 12.5.' });
    expect(parseDraft('item-result', '18', 'fail', ' slow leak ')).toEqual({ ok: true, value: { outcome: 'fail', value: 18, note: 'slow leak' } });
    expect(parseDraft('item-result', '', undefined)).toMatchObject({ ok: false });
    expect(parseDraft('json', '[1,')).toMatchObject({ ok: false });
  });
});
