import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  RECORD_KINDS, fieldNames, validatePatch, validateRecord, mergeRuleOf, isImmutableField, patchIsValid, validateChangedRecord,
} from '../src/index.js';
import { FIXTURES } from './support/fixtures.js';

const errorsOf = (r: { ok: boolean; errors?: { field: string; message: string }[] }) => (r.ok ? [] : r.errors!);

describe('record validation', () => {
  it.each(RECORD_KINDS)('accepts a complete %s and every single-field patch of it', (kind) => {
    const fields = FIXTURES[kind] as Record<string, unknown>;
    expect(errorsOf(validateRecord(kind, fields))).toEqual([]);
    expect(Object.keys(fields).sort()).toEqual(fieldNames(kind).sort());
    for (const [k, v] of Object.entries(fields)) expect(validatePatch(kind, { [k]: v }).ok).toBe(true);
  });

  it.each(RECORD_KINDS)('refuses unknown fields and sync columns in a %s patch', (kind) => {
    const r = validatePatch(kind, { clubId: 'x', colour: 'red' });
    expect(errorsOf(r).map((e) => e.field).sort()).toEqual(['clubId', 'colour']);
    expect(errorsOf(r)[0]!.message).toMatch(/has no field "(clubId|colour)"; remove it\./);
  });

  it('refuses text holding the NUL character, in a value or a key at any depth, naming the field', () => {
    // PostgreSQL stores neither text nor JSON with U+0000 (its documentation on character types).
    const inDescription = validatePatch('defect', { description: 'Strap\u0000 frayed' });
    expect(errorsOf(inDescription)).toEqual([{
      field: 'description',
      message: 'The description holds an invisible control character (NUL) that cannot be saved; retype it or paste it again as plain text.',
    }]);
    expect(patchIsValid('defect', { description: 'Strap\u0000 frayed' })).toBe(false);
    const check = FIXTURES.check as Record<string, unknown>;
    const nested = { ...check, results: { hull: { outcome: 'fail', note: 'Split\u0000seam' } } };
    expect(errorsOf(validateRecord('check', nested))[0]!.field).toBe('results.hull.note');
    expect(errorsOf(validatePatch('check', { results: { 'hu\u0000ll': { outcome: 'pass' } } }))[0]!.field).toBe('results.hu\u0000ll');
    expect(validatePatch('defect', { description: 'Strap frayed near the bow' }).ok).toBe(true);
  });

  it('refuses text holding half of a surrogate pair, in a value or a key, and keeps whole emoji', () => {
    // JSON text must be well-formed UTF-16 to become UTF-8; PostgreSQL's jsonb refuses a lone
    // surrogate (its JSON types documentation, on \u escapes).
    for (const broken of ['Strap \ud83d frayed', 'Strap \ude00 frayed', 'frayed \ud83d']) {
      expect(errorsOf(validatePatch('defect', { description: broken }))).toEqual([{
        field: 'description',
        message: 'The description holds a broken character (half of an emoji or symbol) that cannot be saved; retype it or paste it again.',
      }]);
      expect(patchIsValid('defect', { description: broken })).toBe(false);
    }
    const check = FIXTURES.check as Record<string, unknown>;
    expect(errorsOf(validateRecord('check', { ...check, results: { hull: { outcome: 'fail', note: 'Split \udc00' } } }))[0]!.field).toBe('results.hull.note');
    expect(errorsOf(validatePatch('check', { results: { 'hu\ud800ll': { outcome: 'pass' } } }))[0]!.field).toBe('results.hu\ud800ll');
    expect(validatePatch('defect', { description: 'Strap frayed \ud83d\ude00 near the bow' }).ok).toBe(true);
  });

  it('finds half a surrogate pair the same way where the browser has no isWellFormed', () => {
    const proto = String.prototype as { isWellFormed?: () => boolean };
    const own = proto.isWellFormed;
    delete proto.isWellFormed;
    try {
      for (const broken of ['\ud83d', 'a\ud83d', '\ude00b', 'a\ude00\ud83d', 'ok \ud83d\ude00 \ud83d']) expect(patchIsValid('defect', { description: broken })).toBe(false);
      for (const whole of ['plain', '\ud83d\ude00', 'a\ud83d\ude00b\ud83c\udf0a']) expect(patchIsValid('defect', { description: whole })).toBe(true);
    } finally {
      if (own) proto.isWellFormed = own;
    }
  });

  it('names the missing fields of a whole record', () => {
    const { description: _d, ...rest } = FIXTURES.defect;
    expect(errorsOf(validateRecord('defect', rest))).toEqual([{ field: 'description', message: 'Description is required.' }]);
  });

  it('explains wrong values in words a person can act on', () => {
    const cases: [string, Record<string, unknown>, string, string][] = [
      ['defect', { status: 'fixed' }, 'status', 'Status must be one of: open, assigned, repaired, verified, rejected.'],
      ['defect', { reportedAt: '2026-12-05 21:30' }, 'reportedAt', 'Reported at must be a UTC date and time such as 2026-12-01T09:30:00Z.'],
      ['defect', { photos: ['xyz'] }, 'photos.0', 'Photos #1 must be a photo reference (the SHA-256 of the photo, 64 lowercase hex characters).'],
      ['defect', { boatId: 'boat-3' }, 'boatId', 'Boat must be a record id (a UUID).'],
      ['defect', { description: '   ' }, 'description', 'Description must not be blank.'],
      ['trip', { windSpeedKn: -3 }, 'windSpeedKn', 'Wind speed (knots) must be at least 0.'],
      ['trip', { windDirectionDeg: 360 }, 'windDirectionDeg', 'Wind direction (degrees) must be less than 360.'],
      ['trip', { purpose: 'joyride' }, 'purpose', 'Purpose must be one of: patrol, training, rescue, search, preventive-action, event-support, maintenance-run.'],
      ['trip', { retrievedAt: 5 }, 'retrievedAt', 'Retrieved at must be a UTC date and time such as 2026-12-01T09:30:00Z.'],
      ['incidentNote', { peopleHelped: 1.5 }, 'peopleHelped', 'People helped must be a whole number.'],
      ['boat', { inService: 'yes' }, 'inService', 'In service must be yes or no (true or false).'],
      ['boat', { airChambers: [{ id: 'p', name: 'port pontoon', valve: '', minKpa: 30, maxKpa: 20 }] }, 'airChambers.0.minKpa', 'Air chambers #1 minimum pressure (kPa) must not be above the maximum pressure.'],
      ['signOn', { sessionDate: '2026-02-30' }, 'sessionDate', 'Session date must be a date such as 2026-12-01.'],
      ['boat', { name: null }, 'name', 'Name must be filled in.'],
    ];
    for (const [kind, patch, field, message] of cases) {
      expect(errorsOf(validatePatch(kind as 'trip', patch)), `${kind} ${field}`).toEqual([{ field, message }]);
    }
  });

  it('applies the rules across fields of a whole record', () => {
    const trip = { ...FIXTURES.trip, retrievedAt: '2026-12-05T21:00:00Z' };
    expect(errorsOf(validateRecord('trip', trip))).toEqual([{ field: 'retrievedAt', message: 'Retrieval must not be before launch.' }]);
    const motor = { ...FIXTURES.motor, premixRatio: null };
    expect(errorsOf(validateRecord('motor', motor))[0]!.field).toBe('premixRatio');
    const defect = { ...FIXTURES.defect, status: 'rejected', rejectedReason: ' ' };
    expect(errorsOf(validateRecord('defect', defect))[0]!.field).toBe('rejectedReason');
    const check = { ...FIXTURES.check, status: 'complete' };
    expect(errorsOf(validateRecord('check', check))[0]!.field).toBe('completedAt');
    const template = { ...FIXTURES.checkTemplate, sections: [{ ...FIXTURES.checkTemplate.sections[0]!, items: [{ id: 'n', label: 'Tubes', kind: 'count', critical: false }] }] };
    expect(errorsOf(validateRecord('checkTemplate', template))[0]!.field).toBe('sections.0.items.0.required');
  });

  it('refuses things that are not records or kinds', () => {
    expect(errorsOf(validatePatch('defect', [1]))[0]!.message).toBe('A change must be a group of fields.');
    expect(errorsOf(validateRecord('canoe' as 'defect', {}))[0]!.message).toMatch(/Unknown record kind "canoe"/);
  });

  it('keeps merge rules and immutable fields as data', () => {
    expect(mergeRuleOf('defect', 'notes')).toBe('union');
    expect(mergeRuleOf('defect', 'status')).toBe('defect-status');
    expect(mergeRuleOf('check', 'results')).toBe('check-results');
    expect(mergeRuleOf('trip', 'purpose')).toBe('lww');
    expect(isImmutableField('check', 'boatId')).toBe(true);
    expect(isImmutableField('check', 'status')).toBe(false);
  });
});

describe('validation of only what changed', () => {
  // Values from every kind's fixture, plus wrong ones, so changes are sometimes valid and sometimes not.
  const POOL: unknown[] = [
    ...new Set(RECORD_KINDS.flatMap((k) => Object.values(FIXTURES[k] as Record<string, unknown>)).map((v) => JSON.stringify(v))),
  ].map((v) => JSON.parse(v));
  POOL.push(null, '', 'x', -1, 3.5, [], {}, true, 'rejected', 'verified', 'open', 'a'.repeat(5000));
  const kindArb = fc.constantFrom(...RECORD_KINDS);
  const changesArb = (kind: (typeof RECORD_KINDS)[number]) =>
    fc.dictionary(fc.constantFrom(...fieldNames(kind), 'colour'), fc.constantFrom(...POOL), { maxKeys: 4 });

  it('gives what validatePatch gives, field by field', () => {
    fc.assert(fc.property(kindArb.chain((kind) => fc.tuple(fc.constant(kind), changesArb(kind))), ([kind, patch]) => {
      expect(patchIsValid(kind, patch)).toBe(validatePatch(kind, patch).ok);
    }), { numRuns: 1000 });
    expect(patchIsValid('defect', null)).toBe(false);
    expect(patchIsValid('defect', { description: 'Kill cord frayed' })).toBe(true);
  });

  it('gives what validateRecord gives for a valid record with some fields changed', () => {
    let refused = 0;
    fc.assert(fc.property(kindArb.chain((kind) => fc.tuple(fc.constant(kind), changesArb(kind))), ([kind, changes]) => {
      const before = validateRecord(kind, FIXTURES[kind]);
      if (!before.ok) throw new Error(`the ${kind} fixture must be valid`);
      const fields = { ...(FIXTURES[kind] as Record<string, unknown>), ...changes };
      const whole = validateRecord(kind, fields);
      if (!whole.ok) refused += 1;
      expect(validateChangedRecord(kind, before.value as never, fields, Object.keys(changes))).toEqual(whole);
    }), { numRuns: 1000 });
    expect(refused).toBeGreaterThan(100);
    expect(refused).toBeLessThan(900);
  });
});
