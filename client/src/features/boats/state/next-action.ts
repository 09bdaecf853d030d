import type { BoatState, Readiness } from '@breakline/sync-protocol';

export interface NextAction {
  /** What the person should do now, in plain words. */
  text: string;
  /** The check to open from the card, when the next step is a check. */
  check?: 'launch' | 'stow';
  /** Said loudly: the boat must not be launched. */
  warning?: boolean;
}

const inProgress = (readiness: Readiness) => readiness.reasons.some((r) => r.startsWith('unchecked: launch check in progress'));

const ACTIONS: Record<BoatState, (r: Readiness) => NextAction> = {
  unchecked: (r) => ({ text: inProgress(r) ? 'Carry on with the launch check' : 'Run the launch check', check: 'launch' }),
  // A launch check already begun may still be finished: its answers are what the repair needs.
  'stood-down': (r) => ({
    text: 'Stood down: do not launch. A supervisor returns it to service once the fault is repaired.',
    warning: true,
    check: inProgress(r) ? 'launch' : undefined,
  }),
  limited: () => ({ text: 'May launch only within the limits listed. Run the stow check after the last trip.', check: 'stow' }),
  fit: () => ({ text: 'Fit to launch. Run the stow check after the last trip.', check: 'stow' }),
  afloat: () => ({ text: 'On the water. Log the retrieval when it is back on the sand.' }),
  stowed: () => ({ text: 'Stowed, ready for the next call-out. Run the launch check before it goes out.', check: 'launch' }),
};

export function nextAction(readiness: Readiness): NextAction {
  return ACTIONS[readiness.state](readiness);
}
