import type { KindFields, PressureUnit } from '@breakline/sync-protocol';
import { draftKpa, pressureDraft, type PressureDraft } from './pressure-draft';

export interface ChamberDraft {
  /** What check items name the chamber by; fixed once saved, so old readings keep their chamber. */
  id: string;
  name: string;
  valve: string;
  min: PressureDraft;
  max: PressureDraft;
}

export interface BoatDraft {
  fleetNumber: string;
  name: string;
  hullSerial: string;
  notes: string;
  inService: boolean;
  chambers: ChamberDraft[];
  gear: { item: string; count: string }[];
}

type BoatFields = KindFields['boat'];
export type DraftErrors = Record<string, string>;

// What an IRB usually carries (common practice; the club's own list comes first).
export const USUAL_GEAR: readonly { item: string; count: number }[] = [
  { item: 'Rescue tube', count: 1 },
  { item: 'Paddle', count: 2 },
  { item: 'Tow rope', count: 1 },
  { item: 'Knife', count: 1 },
  { item: 'Whistle', count: 1 },
  { item: 'Life jacket', count: 2 },
  { item: 'Waterproof radio', count: 1 },
];

// A typical IRB has three inflation valves: the two side pontoons and the bow (common practice).
// The ranges are left empty: they are the maker's figures for each boat.
export function newBoatDraft(): BoatDraft {
  const chamber = (id: string, name: string) => ({ id, name, valve: '', min: { text: '' }, max: { text: '' } });
  return {
    fleetNumber: '', name: '', hullSerial: '', notes: '', inService: true,
    chambers: [chamber('port', 'Port side pontoon'), chamber('starboard', 'Starboard side pontoon'), chamber('bow', 'Bow chamber')],
    gear: USUAL_GEAR.map((g) => ({ item: g.item, count: String(g.count) })),
  };
}

export function boatDraftOf(b: BoatFields, unit: PressureUnit): BoatDraft {
  return {
    fleetNumber: b.fleetNumber, name: b.name, hullSerial: b.hullSerial ?? '', notes: b.notes, inService: b.inService,
    chambers: b.airChambers.map((c) => ({ id: c.id, name: c.name, valve: c.valve, min: pressureDraft(c.minKpa, unit), max: pressureDraft(c.maxKpa, unit) })),
    gear: b.requiredGear.map((g) => ({ item: g.item, count: String(g.count) })),
  };
}

/** A chamber id from its name, unlike the ids already used: "Port side pontoon" → "port-side-pontoon". */
export function chamberId(name: string, taken: readonly string[]): string {
  const base = name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 30) || 'chamber';
  let id = base;
  for (let n = 2; taken.includes(id); n++) id = `${base}-${n}`;
  return id;
}

export function buildBoat(d: BoatDraft, unit: PressureUnit): { ok: true; fields: BoatFields } | { ok: false; errors: DraftErrors } {
  const errors: DraftErrors = {};
  if (!d.fleetNumber.trim()) errors.fleetNumber = 'Enter the fleet number painted on the boat.';
  if (!d.name.trim()) errors.name = 'Enter the boat’s name.';
  const airChambers = d.chambers.map((c, i) => {
    if (!c.name.trim()) errors[`chambers.${i}.name`] = 'Name the air chamber.';
    const min = draftKpa(c.min, unit), max = draftKpa(c.max, unit);
    if (!min.ok) errors[`chambers.${i}.min`] = min.message;
    if (!max.ok) errors[`chambers.${i}.max`] = max.message;
    if (min.ok && max.ok && min.kpa > max.kpa) errors[`chambers.${i}.min`] = 'The lowest pressure must not be above the highest.';
    return { id: c.id, name: c.name.trim(), valve: c.valve.trim(), minKpa: min.ok ? min.kpa : 0, maxKpa: max.ok ? max.kpa : 0 };
  });
  const requiredGear = d.gear.map((g, i) => {
    const count = Number(g.count);
    if (!g.item.trim()) errors[`gear.${i}.item`] = 'Name the item, or remove the line.';
    if (!Number.isInteger(count) || count < 1) errors[`gear.${i}.count`] = 'Enter how many, a whole number from 1.';
    return { item: g.item.trim(), count };
  });
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const hullSerial = d.hullSerial.trim() || null;
  return { ok: true, fields: { fleetNumber: d.fleetNumber.trim(), name: d.name.trim(), hullSerial, airChambers, requiredGear, notes: d.notes, inService: d.inService } };
}
