import type { FailureReason } from '@/db/types';
import type { SyncStatus } from './status';

const FAILURE_HEADLINE: Record<FailureReason, string> = {
  offline: 'No signal',
  'signed-out': 'Signed out',
  outdated: 'App out of date',
  server: 'Server error',
  storage: 'Phone storage full',
  photos: 'Photos not sent',
  app: 'Sync stopped',
};

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;

export const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** "just now", "12 minutes ago", "3 hours ago", "2 days ago"; a time ahead of the phone's is "just now". */
export function relativeTime(iso: string, now: number): string {
  const ago = now - Date.parse(iso);
  if (Number.isNaN(ago)) return 'at an unknown time';
  if (ago < MINUTE) return 'just now';
  if (ago < HOUR) return `${plural(Math.floor(ago / MINUTE), 'minute')} ago`;
  if (ago < DAY) return `${plural(Math.floor(ago / HOUR), 'hour')} ago`;
  return `${plural(Math.floor(ago / DAY), 'day')} ago`;
}

export function waitingText(waiting: number): string {
  return waiting === 0 ? 'All changes sent' : `${plural(waiting, 'change')} waiting to be sent`;
}

/** Null when no photo waits, so the line is left out. */
export function photosWaitingText(waiting: number): string | null {
  return waiting === 0 ? null : `${plural(waiting, 'photo')} waiting to be sent`;
}

export function lastSyncText(lastSyncAt: string | null, now: number): string {
  return lastSyncAt ? `Last synced ${relativeTime(lastSyncAt, now)}` : 'Not synced yet on this phone';
}

export function progressText(s: Pick<SyncStatus, 'running' | 'progress'>): string | null {
  if (!s.running) return null;
  const p = s.progress;
  if (!p) return 'Syncing…';
  if (p.phase === 'sending') return `Sending changes: ${p.done.toLocaleString('en')} of ${p.total.toLocaleString('en')}`;
  if (p.phase === 'photos') return `Sending photos: ${p.done.toLocaleString('en')} of ${p.total.toLocaleString('en')}`;
  if (p.total !== undefined) return `Receiving changes: ${p.done.toLocaleString('en')} of about ${p.total.toLocaleString('en')}`;
  return `Receiving changes: ${p.done.toLocaleString('en')}${p.more ? ' so far' : ''}`;
}

export function conflictsText(open: number): string | null {
  return open === 0 ? null : `${plural(open, 'conflict')} waiting for a supervisor`;
}

/** The one-line summary beside the icon, most urgent first. */
export function headline(s: SyncStatus, now: number): string {
  return (
    progressText(s) ??
    (s.lastError ? FAILURE_HEADLINE[s.lastError.reason] : null) ??
    (s.waiting > 0 ? waitingText(s.waiting) : null) ??
    (s.waitingElsewhere.length > 0 ? 'Changes waiting for another club' : null) ??
    photosWaitingText(s.photosWaiting) ??
    lastSyncText(s.lastSyncAt, now)
  );
}
