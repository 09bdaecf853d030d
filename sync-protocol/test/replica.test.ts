import { describe, expect, it } from 'vitest';
import { buildMutation, overlayPending, type SyncRecord } from '../src/index.js';

const shadow: SyncRecord = {
  id: 'r1', kind: 'trip', clubId: 'c', version: 4, hlc: 'h', updatedAt: '2026-12-05T21:30:00Z', deleted: false,
  fields: { purpose: 'patrol', windSpeedKn: 12 },
};

describe('local view of a record', () => {
  it('shows pulled fields with pending edits reapplied in order', () => {
    const v = overlayPending('r1', 'trip', shadow, [{ patch: { purpose: 'rescue' } }, { patch: { purpose: 'search', windSpeedKn: 20 } }]);
    expect(v).toEqual({ id: 'r1', kind: 'trip', version: 4, fields: { purpose: 'search', windSpeedKn: 20 }, deleted: false, pending: 2 });
    expect(shadow.fields.purpose).toBe('patrol');
  });

  it('shows a record created here before the server has it, and hides a pending delete', () => {
    expect(overlayPending('r2', 'trip', undefined, [{ patch: { purpose: 'training' } }])).toMatchObject({ version: 0, fields: { purpose: 'training' } });
    expect(overlayPending('r1', 'trip', shadow, [{ patch: {}, deleted: true }])!.deleted).toBe(true);
    expect(overlayPending('r3', 'trip', undefined, [])).toBeUndefined();
  });

  it('shows a record deleted elsewhere again while an edit made here waits, as the server will keep it', () => {
    const gone = { ...shadow, version: 5, deleted: true };
    expect(overlayPending('r1', 'trip', gone, [{ patch: { purpose: 'rescue' } }])).toMatchObject({ deleted: false, fields: { purpose: 'rescue' } });
    expect(overlayPending('r1', 'trip', gone, [])!.deleted).toBe(true);
    expect(overlayPending('r1', 'trip', shadow, [{ patch: { purpose: 'rescue' } }, { patch: {}, deleted: true }])!.deleted).toBe(true);
  });

  it('builds a mutation whose base is what the device showed', () => {
    const view = overlayPending('r1', 'trip', shadow, [{ patch: { purpose: 'rescue' } }]);
    const m = buildMutation({ mutationId: 'm', seq: 7, hlc: 'h2', view, kind: 'trip', recordId: 'r1', patch: { purpose: 'search' } });
    expect(m).toEqual({ mutationId: 'm', seq: 7, recordId: 'r1', kind: 'trip', baseVersion: 4, base: { purpose: 'rescue' }, hlc: 'h2', patch: { purpose: 'search' } });
    const del = buildMutation({ mutationId: 'm2', seq: 8, hlc: 'h3', view, kind: 'trip', recordId: 'r1', patch: {}, deleted: true });
    expect(del.base).toEqual({ purpose: 'rescue', windSpeedKn: 12 });
    expect(del.deleted).toBe(true);
  });
});
