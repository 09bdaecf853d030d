import type { DefectSeverity, DefectStatus } from '@breakline/sync-protocol';

export const SEVERITY_META: Record<DefectSeverity, { word: string; meaning: string; colour: string }> = {
  'stand-down': { word: 'Stand-down', meaning: 'The boat may not launch', colour: 'error.main' },
  limit: { word: 'Limit', meaning: 'May launch within a stated limit', colour: '#7A5200' },
  note: { word: 'Note', meaning: 'Advisory; the boat may launch', colour: 'text.secondary' },
};

export const STATUS_WORDS: Record<DefectStatus, string> = {
  open: 'Open',
  assigned: 'Assigned',
  repaired: 'Repaired, waiting for a supervisor to verify',
  verified: 'Verified: back in service',
  rejected: 'Rejected: not a defect',
};

/** Worst first, so a stand-down defect is never below the fold. */
export const SEVERITY_RANK: Record<DefectSeverity, number> = { 'stand-down': 0, limit: 1, note: 2 };
