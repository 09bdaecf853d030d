import type { DefectStatus, Role } from '@breakline/sync-protocol';
import { describe, expect, it } from 'vitest';
import { defectFields } from '../testing/records';
import { availableActions } from './actions';

describe('defect steps by role, from the shared permission rules', () => {
  it.each<[DefectStatus, Role, string[]]>([
    ['open', 'crew', []],
    ['open', 'driver', ['repair']],
    ['open', 'supervisor', ['assign', 'repair', 'reject']],
    ['open', 'admin', ['assign', 'repair', 'reject']],
    ['assigned', 'driver', ['repair']],
    ['repaired', 'driver', []],
    ['repaired', 'supervisor', ['verify', 'reject']],
    ['verified', 'crew', ['reopen']],
    ['rejected', 'supervisor', ['reopen']],
  ])('a %s defect: %s may %j', (status, role, actions) => {
    const extra = status === 'verified' ? { verifiedBy: 'u-9', verifiedAt: '2026-12-01T01:00:00Z' } : status === 'rejected' ? { rejectedReason: 'Not a fault' } : {};
    expect(availableActions(defectFields({ status, ...extra }), role, 'u-1')).toEqual(actions);
  });
});
