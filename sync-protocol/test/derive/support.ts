import { expect } from 'vitest';

/** Asserts |actual - expected| ≤ rel × |expected|. */
export function expectRelative(actual: number, expected: number, rel: number): void {
  const error = Math.abs(actual - expected) / Math.abs(expected);
  expect(error, `${actual} vs ${expected}: relative error ${error} over ${rel}`).toBeLessThanOrEqual(rel);
}

const view = new DataView(new ArrayBuffer(8));

/** The next representable double above a non-negative x: the closest value past a band edge. */
export function nextUp(x: number): number {
  if (x === 0) return Number.MIN_VALUE;
  view.setFloat64(0, x);
  view.setBigUint64(0, view.getBigUint64(0) + 1n);
  return view.getFloat64(0);
}

/** The next representable double below a positive x. */
export function nextDown(x: number): number {
  view.setFloat64(0, x);
  view.setBigUint64(0, view.getBigUint64(0) - 1n);
  return view.getFloat64(0);
}
