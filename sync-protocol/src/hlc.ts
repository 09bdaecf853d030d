import { HlcFormatError } from './hlc-errors.js';

/** A hybrid logical clock value: l = logical ms since the epoch, c = counter, node = writer. */
export type Hlc = { l: number; c: number; node: string };

/** Fixed widths make string order equal clock order. 15 digits of ms reach the year 33658. */
export const HLC_L_DIGITS = 15;
export const HLC_C_DIGITS = 5;
export const MAX_HLC_L = 10 ** HLC_L_DIGITS - 1;
export const MAX_HLC_COUNTER = 10 ** HLC_C_DIGITS - 1;
/** Node ids are device ids or a server name; kept to characters that need no escaping. */
export const HLC_NODE_PATTERN = /^[A-Za-z0-9._:-]{1,64}$/;

const ENCODED = new RegExp(`^(\\d{${HLC_L_DIGITS}})-(\\d{${HLC_C_DIGITS}})-(.+)$`);

function checkParts(h: Hlc, input: unknown): void {
  if (!Number.isSafeInteger(h.l) || h.l < 0 || h.l > MAX_HLC_L) {
    throw new HlcFormatError(input, `time must be a whole number of ms from 0 to ${MAX_HLC_L}`);
  }
  if (!Number.isSafeInteger(h.c) || h.c < 0 || h.c > MAX_HLC_COUNTER) {
    throw new HlcFormatError(input, `counter must be a whole number from 0 to ${MAX_HLC_COUNTER}`);
  }
  if (typeof h.node !== 'string' || !HLC_NODE_PATTERN.test(h.node)) {
    throw new HlcFormatError(input, 'node id must be 1-64 letters, digits or . _ : -');
  }
}

/** "000001733000000-00003-device-1": l padded, c padded, then the node id. */
export function encodeHlc(h: Hlc): string {
  checkParts(h, h);
  const l = String(h.l).padStart(HLC_L_DIGITS, '0');
  const c = String(h.c).padStart(HLC_C_DIGITS, '0');
  return `${l}-${c}-${h.node}`;
}

export function decodeHlc(s: string): Hlc {
  if (typeof s !== 'string') throw new HlcFormatError(s, 'expected a string');
  const m = ENCODED.exec(s);
  if (!m) {
    throw new HlcFormatError(s, `expected ${HLC_L_DIGITS} digits, "-", ${HLC_C_DIGITS} digits, "-", node id`);
  }
  const h = { l: Number(m[1]), c: Number(m[2]), node: m[3] as string };
  checkParts(h, s);
  return h;
}

export function isEncodedHlc(s: unknown): s is string {
  if (typeof s !== 'string') return false;
  try {
    decodeHlc(s);
    return true;
  } catch {
    return false;
  }
}

function sign(a: string | number, b: string | number): -1 | 0 | 1 {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** Clock order: (l, c) lexicographically, then node id by code unit, like the encoded string. */
export function compareHlc(a: Hlc, b: Hlc): -1 | 0 | 1 {
  return sign(a.l, b.l) || sign(a.c, b.c) || sign(a.node, b.node);
}

/** Order of two encoded values; plain string order is clock order by construction. */
export function compareEncodedHlc(a: string, b: string): -1 | 0 | 1 {
  return sign(a, b);
}

export function maxEncodedHlc(a: string, b: string): string {
  return a >= b ? a : b;
}
