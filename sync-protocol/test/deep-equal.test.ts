import { describe, expect, it } from 'vitest';
import { deepEqual } from '../src/index.js';

describe('deepEqual (JSON semantics)', () => {
  const table: [string, unknown, unknown, boolean][] = [
    ['equal scalars', 3, 3, true],
    ['number against string', 3, '3', false],
    ['null against undefined', null, undefined, false],
    ['null against null', null, null, true],
    ['absent key against undefined key', {}, { a: undefined }, true],
    ['absent key against null key', {}, { a: null }, false],
    ['object key order does not matter', { a: 1, b: { c: [1, 2] } }, { b: { c: [1, 2] }, a: 1 }, true],
    ['array order matters', [1, 2], [2, 1], false],
    ['array length matters', [1], [1, undefined], false],
    ['array against object with index keys', [1], { 0: 1 }, false],
    ['nested difference', { a: [{ b: 1 }] }, { a: [{ b: 2 }] }, false],
    ['empty array against empty object', [], {}, false],
    ['NaN equals NaN', Number.NaN, Number.NaN, true],
    ['false against 0', false, 0, false],
    ['empty string against null', '', null, false],
  ];
  it.each(table)('%s', (_name, a, b, expected) => {
    expect(deepEqual(a, b)).toBe(expected);
    expect(deepEqual(b, a)).toBe(expected);
  });
});
