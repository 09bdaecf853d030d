import { describe, expect, it } from 'vitest';
import { paths, safeNextPath } from './paths';

describe('paths', () => {
  it('builds the sign-in link with the page to return to', () => {
    expect(paths.signIn.href('/defects?boat=2')).toBe('/sign-in?next=%2Fdefects%3Fboat%3D2');
    expect(paths.signIn.href('/')).toBe('/sign-in');
  });

  it('follows only in-app paths after sign-in', () => {
    expect(safeNextPath('/trips')).toBe('/trips');
    expect(safeNextPath('//elsewhere.example')).toBe('/');
    expect(safeNextPath('/\\elsewhere.example')).toBe('/');
    expect(safeNextPath('https://elsewhere.example')).toBe('/');
    expect(safeNextPath(null)).toBe('/');
  });
});
