import { describe, expect, it } from 'vitest';
import { ROLES, canCreate, canDelete, canSee, canUpdate, checkCreate, checkUpdate, type RecordKind, type Role } from '../src/index.js';
import { FIXTURES } from './support/fixtures.js';

const rolesFrom = (min: Role) => ROLES.slice(ROLES.indexOf(min));

describe('who may create', () => {
  const table: [RecordKind, Role][] = [
    ['boat', 'supervisor'], ['motor', 'supervisor'], ['checkTemplate', 'admin'], ['serviceRecord', 'supervisor'],
    ['trip', 'driver'], ['daySignOff', 'driver'], ['motorMove', 'driver'],
    ['check', 'crew'], ['defect', 'crew'], ['signOn', 'crew'], ['incidentNote', 'crew'],
  ];
  it.each(table)('%s needs at least %s', (kind, min) => {
    for (const role of ROLES) expect(canCreate(kind, role), role).toBe(rolesFrom(min).includes(role));
  });

  it('says who may, in the refusal', () => {
    expect(checkCreate('boat', 'driver')).toEqual({ ok: false, reason: 'Only a supervisor or admin may add a boat.' });
  });

  it('lets anyone raise a defect, but not pre-set a supervisor-only field', () => {
    expect(canCreate('defect', 'crew', FIXTURES.defect)).toBe(true);
    expect(checkCreate('defect', 'crew', { ...FIXTURES.defect, status: 'verified' })).toEqual({
      ok: false,
      reason: 'Only a supervisor or admin may set the status of a defect to "verified".',
    });
    expect(canCreate('defect', 'supervisor', { ...FIXTURES.defect, assignedTo: 'member-cy' })).toBe(true);
  });

  it('lets a crew member write an incident note only in their own name', () => {
    expect(canCreate('incidentNote', 'crew', FIXTURES.incidentNote, 'member-ana')).toBe(true);
    expect(canCreate('incidentNote', 'crew', FIXTURES.incidentNote, 'member-ben')).toBe(false);
    expect(canCreate('incidentNote', 'driver', FIXTURES.incidentNote, 'member-ben')).toBe(true);
  });
});

describe('records in a member\'s own name', () => {
  // Who did a check, reported a defect, moved a motor or signed off a day is the member writing
  // it; only a supervisor enters one for someone else (a paper check typed in afterwards).
  const cases: [RecordKind, string][] = [['check', 'performedBy'], ['defect', 'reportedBy'], ['motorMove', 'movedBy'], ['daySignOff', 'signedOffBy']];
  it.each(cases)('takes a %s with the writer in %s, and refuses another member\'s name below supervisor', (kind, field) => {
    const fields = { ...(FIXTURES[kind] as Record<string, unknown>), [field]: 'member-ana' };
    expect(checkCreate(kind, 'driver', fields, 'member-ana')).toEqual({ ok: true });
    const forged = checkCreate(kind, 'driver', fields, 'member-ben');
    expect(forged.ok).toBe(false);
    expect(!forged.ok && forged.reason).toMatch(/^You may only enter .+ in your own name \(.+\); a supervisor may enter one for someone else\.$/);
    expect(checkCreate(kind, 'supervisor', fields, 'member-ben')).toEqual({ ok: true });
  });

  it('lets a supervisor sign off a check done by someone else, and a driver sign off a day only as themself', () => {
    const check = { ...FIXTURES.check, performedBy: 'member-ana' };
    expect(checkUpdate('check', 'supervisor', { signedOffBy: 'member-cy' }, check, 'member-cy').ok).toBe(true);
    const day = { ...FIXTURES.daySignOff, signedOffBy: 'member-ana' };
    expect(checkUpdate('daySignOff', 'driver', { signedOffBy: 'member-ben' }, day, 'member-ana').ok).toBe(false);
    expect(checkUpdate('daySignOff', 'driver', { signedOffBy: 'member-ben', note: 'Handed over' }, day, 'member-ben').ok).toBe(true);
  });
});

describe('who may update', () => {
  const d = FIXTURES.defect;
  const table: [string, RecordKind, Role, Record<string, unknown>, Record<string, unknown>, boolean][] = [
    ['crew adds a defect note', 'defect', 'crew', { notes: [{ at: d.reportedAt, by: 'x', text: 'still leaking' }] }, d, true],
    ['crew verifies a defect', 'defect', 'crew', { status: 'verified' }, d, false],
    ['driver rejects a defect', 'defect', 'driver', { status: 'rejected' }, d, false],
    ['supervisor verifies a defect', 'defect', 'supervisor', { status: 'verified' }, d, true],
    ['admin rejects a defect', 'defect', 'admin', { status: 'rejected' }, d, true],
    ['crew marks repaired', 'defect', 'crew', { status: 'repaired' }, d, false],
    ['driver marks repaired', 'defect', 'driver', { status: 'repaired' }, d, true],
    ['crew reopens a verified defect', 'defect', 'crew', { status: 'open' }, { ...d, status: 'verified' }, true],
    ['crew assigns a defect', 'defect', 'crew', { assignedTo: 'member-cy' }, d, false],
    ['crew raises severity', 'defect', 'crew', { severity: 'stand-down' }, d, true],
    ['crew lowers severity', 'defect', 'crew', { severity: 'note' }, d, false],
    ['supervisor lowers severity', 'defect', 'supervisor', { severity: 'note' }, d, true],
    ['crew resends unchanged supervisor field', 'defect', 'crew', { status: 'open', description: 'two tubes missing' }, d, true],
    ['crew moves a defect to another boat', 'defect', 'admin', { boatId: '0190f1a0-0000-7000-8000-000000000002' }, d, false],
    ['driver edits a boat', 'boat', 'driver', { notes: 'x' }, FIXTURES.boat, false],
    ['supervisor edits a boat', 'boat', 'supervisor', { notes: 'x' }, FIXTURES.boat, true],
    ['driver edits a template', 'checkTemplate', 'driver', { name: 'x' }, FIXTURES.checkTemplate, false],
    ['admin changes the items of a saved template version', 'checkTemplate', 'admin', { sections: [] }, FIXTURES.checkTemplate, false],
    ['admin renumbers a saved template version', 'checkTemplate', 'admin', { templateVersion: 2 }, FIXTURES.checkTemplate, false],
    ['admin retires a template version', 'checkTemplate', 'admin', { retired: true }, FIXTURES.checkTemplate, true],
    ['supervisor retires a template version', 'checkTemplate', 'supervisor', { retired: true }, FIXTURES.checkTemplate, false],
    ['supervisor changes who moved a motor', 'motorMove', 'supervisor', { movedBy: 'member-cy' }, FIXTURES.motorMove, false],
    ['driver reads the hour meter', 'motor', 'driver', { hourMeter: 214 }, FIXTURES.motor, true],
    ['driver changes a motor model', 'motor', 'driver', { model: 'x' }, FIXTURES.motor, false],
    ['crew edits a trip', 'trip', 'crew', { purpose: 'training' }, FIXTURES.trip, false],
    ['driver edits a trip', 'trip', 'driver', { purpose: 'training' }, FIXTURES.trip, true],
    ['crew records a check result', 'check', 'crew', { status: 'complete' }, FIXTURES.check, true],
    ['crew signs off a check', 'check', 'crew', { signedOffBy: 'member-ana' }, FIXTURES.check, false],
    ['crew edits a signed-off check', 'check', 'crew', { status: 'complete' }, { ...FIXTURES.check, signedOffBy: 's', signedOffAt: d.reportedAt }, false],
    ['supervisor edits a signed-off check', 'check', 'supervisor', { status: 'complete' }, { ...FIXTURES.check, signedOffBy: 's', signedOffAt: d.reportedAt }, true],
    ['crew changes the boat of a check', 'check', 'crew', { boatId: '0190f1a0-0000-7000-8000-000000000002' }, FIXTURES.check, false],
  ];
  it.each(table)('%s', (_name, kind, role, patch, current, allowed) => {
    expect(canUpdate(kind, role, patch, current)).toBe(allowed);
  });

  it('explains refusals', () => {
    expect(checkUpdate('check', 'admin', { boatId: '0190f1a0-0000-7000-8000-000000000002' }, FIXTURES.check)).toEqual({
      ok: false,
      reason: 'The boat of a check cannot be changed once it is saved; make a new one instead.',
    });
    expect(checkUpdate('checkTemplate', 'admin', { sections: [] }, FIXTURES.checkTemplate)).toEqual({
      ok: false,
      reason: 'The sections of a check template cannot be changed once it is saved; make a new one instead.',
    });
    expect(checkUpdate('motor', 'driver', { model: 'x' }, FIXTURES.motor)).toEqual({
      ok: false,
      reason: 'Only a supervisor or admin may change the model of a motor.',
    });
  });

  it('lets the author of an incident note edit it, and no other crew member', () => {
    const note = FIXTURES.incidentNote;
    expect(canUpdate('incidentNote', 'crew', { text: 'more' }, note, 'member-ana')).toBe(true);
    expect(canUpdate('incidentNote', 'crew', { text: 'more' }, note, 'member-cy')).toBe(false);
    expect(canUpdate('incidentNote', 'crew', { text: 'more' }, note)).toBe(false);
    expect(canUpdate('incidentNote', 'driver', { text: 'more' }, note, 'member-cy')).toBe(true);
  });
});

describe('who may see and delete', () => {
  it('shows incident notes only to their author and to drivers and up', () => {
    const note = FIXTURES.incidentNote;
    expect(canSee('incidentNote', 'crew', note, 'member-ana')).toBe(true);
    expect(canSee('incidentNote', 'crew', note, 'member-cy')).toBe(false);
    for (const role of ['driver', 'supervisor', 'admin'] as const) expect(canSee('incidentNote', role, note, 'member-cy')).toBe(true);
  });

  it('shows other kinds to every member', () => {
    expect(canSee('defect', 'crew', FIXTURES.defect, 'member-cy')).toBe(true);
    expect(canSee('trip', 'crew', FIXTURES.trip, 'member-cy')).toBe(true);
  });

  it('keeps deletes to the roles that own a kind', () => {
    expect(canDelete('defect', 'driver')).toBe(false);
    expect(canDelete('defect', 'supervisor')).toBe(true);
    expect(canDelete('trip', 'driver')).toBe(true);
    expect(canDelete('boat', 'supervisor')).toBe(false);
    expect(canDelete('incidentNote', 'crew', FIXTURES.incidentNote, 'member-cy')).toBe(false);
  });
});

describe('canSee takes a whole synced record too', () => {
  it('reads the fields of a SyncRecord', () => {
    const rec = { id: 'r', kind: 'incidentNote', clubId: 'c', version: 1, hlc: 'h', updatedAt: 'u', deleted: false, fields: FIXTURES.incidentNote };
    expect(canSee('incidentNote', 'crew', rec, 'member-ana')).toBe(true);
    expect(canSee('incidentNote', 'crew', rec, 'member-cy')).toBe(false);
  });
});
