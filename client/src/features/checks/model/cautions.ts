import { CAUTIONS } from '@breakline/sync-protocol';
import type { TemplateSection } from './types';

/**
 * The safety reminders of a section: those its items carry, and the usual ones for its system,
 * so a club template that lost a caution still shows it.
 */
export function sectionCautions(type: 'launch' | 'stow', section: TemplateSection): string[] {
  const own = section.items.flatMap((i) => (i.caution ? [i.caution] : []));
  return [...new Set([...own, ...usualCautions(type, section.system)])];
}

/** The reminders a screen of this system always shows, whatever its items say. */
export function usualCautions(type: 'launch' | 'stow', system: string): string[] {
  const s = system.trim().toLowerCase();
  const usual: string[] = [];
  if (s === 'motor') usual.push(type === 'launch' ? CAUTIONS.testRun : CAUTIONS.flush);
  if (s === 'motor' && type === 'stow') usual.push(FLUSH_TIME);
  if (s === 'fuel') usual.push(CAUTIONS.fuel);
  return usual;
}

// Common practice, no source: the motor's manual gives the figure for that motor.
export const FLUSH_TIME = 'Flush for three to five minutes, in neutral, hands clear of the propeller, unless the manual says otherwise.';
