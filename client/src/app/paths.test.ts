import { describe, expect, it } from 'vitest';
import { paths, safeNextPath } from './paths';

describe('paths', () => {
  it('builds the sign-in link with the page to return to', () => {
    expect(paths.signIn.href('/defects?boat=2')).toBe('/sign-in?next=%2Fdefects%3Fboat%3D2');
    expect(paths.signIn.href('/')).toBe('/sign-in');
  });

  it('builds the links of the check runner, the boat file and defects', () => {
    expect(paths.checkStart.href({ type: 'stow', boatId: 'b 1' })).toBe('/checks/start?type=stow&boat=b+1');
    expect(paths.checkStart.href()).toBe('/checks/start');
    expect(paths.checkRun.href('c-1', 3)).toBe('/checks/run/c-1?section=3');
    expect(paths.checkRun.href('c-1')).toBe('/checks/run/c-1');
    expect(paths.boatFile.href('a/b')).toBe('/boats/a%2Fb');
    expect(paths.defectNew.href('b-2')).toBe('/defects/new?boat=b-2');
    expect(paths.boatEdit.href()).toBe('/fleet/boats/new');
  });

  it('follows only in-app paths after sign-in', () => {
    expect(safeNextPath('/trips')).toBe('/trips');
    expect(safeNextPath('//elsewhere.example')).toBe('/');
    expect(safeNextPath('/\\elsewhere.example')).toBe('/');
    expect(safeNextPath('https://elsewhere.example')).toBe('/');
    expect(safeNextPath(null)).toBe('/');
  });
});
