import type { BoatState } from '@breakline/sync-protocol';
import { describe, expect, it } from 'vitest';
import { nextAction } from './next-action';

describe('the next action on a boat card', () => {
  it.each<[BoatState, string[], string, 'launch' | 'stow' | undefined]>([
    ['unchecked', ['unchecked: no completed launch check on record'], 'Run the launch check', 'launch'],
    ['unchecked', ['unchecked: launch check in progress'], 'Carry on with the launch check', 'launch'],
    ['stood-down', ['stood down: Drain bungs in and secure failed'], 'Stood down: do not launch.', undefined],
    ['fit', [], 'Fit to launch.', 'stow'],
    ['limited', [], 'May launch only within the limits listed.', 'stow'],
    ['afloat', [], 'On the water.', undefined],
    ['stowed', [], 'Run the launch check before it goes out.', 'launch'],
  ])('%s %j → "%s"', (state, reasons, text, check) => {
    const action = nextAction({ state, reasons });
    expect(action.text).toContain(text);
    expect(action.check).toBe(check);
  });

  it('says a stood-down boat loudly and offers no new check, only to finish one begun', () => {
    const action = nextAction({ state: 'stood-down', reasons: ['stood down: defect "Seam" raised 2026-12-01, open'] });
    expect(action.warning).toBe(true);
    expect(action.check).toBeUndefined();
    expect(nextAction({ state: 'stood-down', reasons: ['unchecked: launch check in progress'] }).check).toBe('launch');
  });
});
