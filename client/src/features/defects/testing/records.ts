import type { KindFields } from '@breakline/sync-protocol';

// Invented test data.
export const BOAT_ID = '0190b000-0000-7000-8000-000000000001';

export const defectFields = (over: Partial<KindFields['defect']> = {}): KindFields['defect'] => ({
  boatId: BOAT_ID, motorId: null, checkId: null, itemId: null, severity: 'stand-down',
  description: 'Starboard pontoon losing air at the valve', photos: [], status: 'open', reportedBy: 'u-1',
  reportedAt: '2026-11-30T22:00:00Z', assignedTo: null, actionTaken: null, repairedAt: null, verifiedBy: null,
  verifiedAt: null, rejectedReason: null, notes: [],
  ...over,
});
