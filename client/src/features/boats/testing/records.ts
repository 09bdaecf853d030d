import { DEFAULT_LAUNCH_TEMPLATE, DEFAULT_STOW_TEMPLATE, type KindFields, type RecordKind } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';

// Invented test data: the figures are not any maker's specification.
export const BOAT_ID = '0190a000-0000-7000-8000-000000000001';
export const MOTOR_ID = '0190a000-0000-7000-8000-000000000002';
export const LAUNCH_TEMPLATE_ID = '0190a000-0000-7000-8000-000000000003';
export const STOW_TEMPLATE_ID = '0190a000-0000-7000-8000-000000000004';

let n = 100;
const nextId = () => `0190a000-0000-7000-8000-${String(n++).padStart(12, '0')}`;

export function local<K extends RecordKind>(kind: K, fields: KindFields[K], id = nextId()): LocalRecord<K> {
  return { id, kind, clubId: 'c-1', version: 1, deleted: false, waiting: 0, fields };
}

export const boatFields = (over: Partial<KindFields['boat']> = {}): KindFields['boat'] => ({
  fleetNumber: 'IRB 2',
  name: 'Gannet',
  hullSerial: 'SHX-22-0417',
  airChambers: [
    { id: 'port', name: 'Port side pontoon', valve: 'Port valve, aft', minKpa: 17, maxKpa: 24 },
    { id: 'starboard', name: 'Starboard side pontoon', valve: 'Starboard valve, aft', minKpa: 17, maxKpa: 24 },
    { id: 'bow', name: 'Bow chamber', valve: 'Bow valve', minKpa: 17, maxKpa: 24 },
  ],
  requiredGear: [{ item: 'Paddle', count: 2 }],
  notes: '',
  inService: true,
  ...over,
});

export const motorFields = (over: Partial<KindFields['motor']> = {}): KindFields['motor'] => ({
  serial: 'TM-30-88121',
  model: '30 hp two-stroke',
  powerHp: 30,
  hourMeter: 120,
  serviceIntervalHours: 100,
  serviceIntervalMonths: 12,
  lastServiceAt: '2026-09-01T02:00:00Z',
  lastServiceHours: 100,
  fuelMode: 'premix',
  premixRatio: 50,
  boatId: BOAT_ID,
  ...over,
});

export const launchTemplate = () => local('checkTemplate', DEFAULT_LAUNCH_TEMPLATE, LAUNCH_TEMPLATE_ID);
export const stowTemplate = () => local('checkTemplate', DEFAULT_STOW_TEMPLATE, STOW_TEMPLATE_ID);

/** Every item of a template passed, pressures mid-range; `results` overrides single items. */
export function passedResults(template: KindFields['checkTemplate']): KindFields['check']['results'] {
  return Object.fromEntries(
    template.sections.flatMap((s) =>
      s.items.map((i) => [i.id, i.kind === 'reading' ? { outcome: 'pass' as const, value: 20 } : { outcome: 'pass' as const }]),
    ),
  );
}

export function checkFields(
  type: 'launch' | 'stow', at: string | null, results: KindFields['check']['results'] = {}, startedAt = at ?? '2026-12-01T00:00:00Z',
): KindFields['check'] {
  const template = type === 'launch' ? DEFAULT_LAUNCH_TEMPLATE : DEFAULT_STOW_TEMPLATE;
  return {
    boatId: BOAT_ID,
    motorId: MOTOR_ID,
    checkType: type,
    templateId: type === 'launch' ? LAUNCH_TEMPLATE_ID : STOW_TEMPLATE_ID,
    templateVersion: 1,
    startedAt,
    completedAt: at,
    status: at ? 'complete' : 'in-progress',
    results: { ...passedResults(template), ...results },
    performedBy: 'u-1',
    signedOffBy: null,
    signedOffAt: null,
  };
}

export const defectFields = (over: Partial<KindFields['defect']> = {}): KindFields['defect'] => ({
  boatId: BOAT_ID,
  motorId: null,
  checkId: null,
  itemId: null,
  severity: 'stand-down',
  description: 'Port pontoon seam lifting near the transom',
  photos: [],
  status: 'open',
  reportedBy: 'u-1',
  reportedAt: '2026-11-30T22:00:00Z',
  assignedTo: null,
  actionTaken: null,
  repairedAt: null,
  verifiedBy: null,
  verifiedAt: null,
  rejectedReason: null,
  notes: [],
  ...over,
});

export const tripFields = (over: Partial<KindFields['trip']> = {}): KindFields['trip'] => ({
  boatId: BOAT_ID,
  motorId: MOTOR_ID,
  purpose: 'patrol',
  driverId: 'u-1',
  crewIds: [],
  launchedAt: '2026-12-01T00:30:00Z',
  retrievedAt: null,
  windSpeedKn: null,
  windDirectionDeg: null,
  waveHeightM: null,
  engineHoursStart: null,
  engineHoursEnd: null,
  fuelAddedL: null,
  notes: [],
  editReasons: [],
  ...over,
});
