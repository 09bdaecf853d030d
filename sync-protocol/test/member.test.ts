import { describe, expect, it } from 'vitest';
import { ROLES, canCreate, canDelete, canSee, checkUpdate, validateRecord, type KindFields } from '../src/index.js';
import { FIXTURES } from './support/fixtures.js';

const card = FIXTURES.member;
const errors = (fields: unknown) => {
  const r = validateRecord('member', fields);
  return r.ok ? [] : r.errors;
};

describe('the member card kind', () => {
  it('accepts a card with a driver award and a crew award that never expires', () => {
    expect(errors(card)).toEqual([]);
  });

  it('refuses an award that expires before it was awarded, naming the field', () => {
    const bad = { ...card, awards: [{ ...card.awards[0]!, awardedOn: '2026-05-01', expiresOn: '2026-04-30' }] };
    expect(errors(bad)).toEqual([{ field: 'awards.0.expiresOn', message: 'Awards #1 expires on must not be before the date it was awarded.' }]);
  });

  it('refuses an award for a role that does not sign on, and a blank award name', () => {
    expect(errors({ ...card, awards: [{ ...card.awards[0]!, qualifies: 'supervisor' }] })[0]).toMatchObject({ field: 'awards.0.qualifies' });
    expect(errors({ ...card, awards: [{ ...card.awards[0]!, name: '  ' }] })[0]).toMatchObject({ field: 'awards.0.name', message: expect.stringMatching(/must not be blank/) });
  });

  it('refuses the same award id twice', () => {
    const twice: KindFields['member'] = { ...card, awards: [card.awards[0]!, { ...card.awards[1]!, id: card.awards[0]!.id }] };
    expect(errors(twice)).toEqual([{ field: 'awards', message: 'Award id "irb-driver" is used twice on this member card.' }]);
  });
});

describe('who may do what with a member card', () => {
  it('is made by an admin only', () => {
    for (const role of ROLES) expect(canCreate('member', role, card), role).toBe(role === 'admin');
  });

  it('is seen by every member of the club', () => {
    for (const role of ROLES) expect(canSee('member', role, card, 'member-cy'), role).toBe(true);
  });

  it('has its awards kept by a supervisor, not by drivers or the member', () => {
    const awards = [...card.awards, { id: 'first-aid', name: 'First aid certificate', qualifies: 'crew' as const, awardedOn: null, expiresOn: '2027-03-01' }];
    expect(checkUpdate('member', 'supervisor', { awards }, card)).toEqual({ ok: true });
    expect(checkUpdate('member', 'driver', { awards }, card, 'member-ben')).toEqual({
      ok: false, reason: 'Only a supervisor or admin may change the awards of a member card.',
    });
  });

  it('has its name changed by an admin only, and its member id never', () => {
    expect(checkUpdate('member', 'supervisor', { displayName: 'B. Arkwright' }, card)).toEqual({
      ok: false, reason: 'Only an admin may change the display name of a member card.',
    });
    expect(checkUpdate('member', 'admin', { displayName: 'B. Arkwright' }, card)).toEqual({ ok: true });
    expect(checkUpdate('member', 'admin', { memberId: 'member-cy' }, card)).toEqual({
      ok: false, reason: 'The member of a member card cannot be changed once it is saved; make a new one instead.',
    });
  });

  it('is deleted by an admin only', () => {
    expect(canDelete('member', 'supervisor', card)).toBe(false);
    expect(canDelete('member', 'admin', card)).toBe(true);
  });
});
