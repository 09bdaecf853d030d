import type { PressureUnit } from './pressure.js';
import type { ServiceState } from './service.js';

export type BoatState = 'unchecked' | 'fit' | 'limited' | 'stood-down' | 'afloat' | 'stowed';

export interface ChamberRange { minKpa: number; maxKpa: number }

export interface ReadinessBoat {
  name: string;
  /** The manufacturer's working range per air chamber, keyed by the chamber's name. */
  chambers?: Readonly<Record<string, ChamberRange>>;
}

export interface CheckItemResult {
  label: string;
  outcome: 'pass' | 'fail' | 'na';
  /** A failed critical item stands the boat down; any other failed item limits it. */
  critical: boolean;
  /** For an air chamber: which one, and the pressure read, in kPa. */
  chamber?: string;
  pressureKpa?: number;
  note?: string;
}

export interface CheckInput {
  type: 'launch' | 'stow';
  status: 'in-progress' | 'complete';
  /** RFC 3339 instant; required once the check is complete. */
  completedAt: string | null;
  results: readonly CheckItemResult[];
}

export interface DefectInput {
  summary: string;
  severity: 'stand-down' | 'limit' | 'note';
  status: 'open' | 'assigned' | 'repaired' | 'verified' | 'rejected';
  reportedAt: string;
  /** The stated limit for a 'limit' defect, e.g. "flat water only". */
  limitation?: string;
}

export interface TripInput { launchedAt: string; retrievedAt: string | null }

export interface ReadinessInput {
  boat: ReadinessBoat;
  /** The boat's latest launch check and latest stow check, if any. */
  launchCheck: CheckInput | null;
  stowCheck: CheckInput | null;
  defects: readonly DefectInput[];
  motorService: { status: ServiceState; reason: string } | null;
  trips: readonly TripInput[];
  /** The instant the state is derived for, and the club's IANA zone that decides "today". */
  now: string;
  zone: string;
  pressureUnit?: PressureUnit;
}

export interface Readiness { state: BoatState; reasons: string[] }
