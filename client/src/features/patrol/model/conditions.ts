import { describeSeaState, describeWind, fromKnots, toKnots, type WindSpeedUnit } from '@breakline/sync-protocol';

const POINTS = ['N', 'NNE', 'NE', 'ENE', 'E', 'ESE', 'SE', 'SSE', 'S', 'SSW', 'SW', 'WSW', 'W', 'WNW', 'NW', 'NNW'];

/** A direction the wind blows from, in degrees true, as a 16-point compass name: 135 → SE. */
export function compassPoint(degrees: number): string {
  return POINTS[Math.round((((degrees % 360) + 360) % 360) / 22.5) % 16]!;
}

const trim = (n: number, places: number) => String(Number(n.toFixed(places)));

/** "12 kn from SE (135°) · Beaufort force 4, moderate breeze", with a marine warning when there is one. */
export function windText(knots: number | null, degrees: number | null, unit: WindSpeedUnit): string | null {
  if (knots === null) return degrees === null ? null : `Wind from ${compassPoint(degrees)} (${degrees}°), speed not recorded`;
  const w = describeWind(knots, 'kn');
  const from = degrees === null ? '' : ` from ${compassPoint(degrees)} (${degrees}°)`;
  const warning = w.warning ? ` · ${w.warning} warning strength` : '';
  return `${trim(fromKnots(knots, unit), 1)} ${unit}${from} · Beaufort force ${w.force}, ${w.term}${warning}`;
}

/** "1.2 m · sea state 3, slight (WMO code 3700)". */
export function seaText(waveHeightM: number | null): string | null {
  if (waveHeightM === null) return null;
  const s = describeSeaState(waveHeightM);
  return `${trim(waveHeightM, 2)} m · sea state ${s.code}, ${s.descriptor}`;
}

export type Parsed = { ok: true; value: number | null } | { ok: false; message: string };

/** A number typed in a box: blank is "not recorded"; a decimal comma is accepted. */
export function parseReading(text: string, what: string, { max, integer = false }: { max: number; integer?: boolean }): Parsed {
  const clean = text.trim().replace(',', '.');
  if (clean === '') return { ok: true, value: null };
  if (!/^\d+(\.\d+)?$|^\.\d+$/.test(clean)) return { ok: false, message: `Enter ${what} as a number, or leave it blank.` };
  const value = Number(clean);
  if (integer && !Number.isInteger(value)) return { ok: false, message: `Enter ${what} as a whole number.` };
  if (value > max) return { ok: false, message: `${what.charAt(0).toUpperCase() + what.slice(1)} must be at most ${max}.` };
  return { ok: true, value };
}

/** A wind speed typed in the club's unit, to knots as stored. */
export function parseWind(text: string, unit: WindSpeedUnit): Parsed {
  const r = parseReading(text, `the wind speed in ${unit}`, { max: fromKnots(200, unit) });
  return r.ok && r.value !== null ? { ok: true, value: toKnots(r.value, unit) } : r;
}

/** A stored knot figure as the text to put back in an entry box in the club's unit. */
export function windEntryText(knots: number | null, unit: WindSpeedUnit): string {
  return knots === null ? '' : trim(fromKnots(knots, unit), 1);
}
