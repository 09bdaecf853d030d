import { describe, expect, it } from 'vitest';
import { rejectedTitle } from './rejected-title';
import { elsewhereText } from './components/elsewhere-text';
import { headline, lastSyncText, photosWaitingText, progressText, relativeTime, waitingText } from './status-text';
import type { SyncStatus } from './status';

const NOW = Date.parse('2026-12-06T09:00:00Z');
const idle: SyncStatus = {
  waiting: 0, lastSyncAt: null, lastError: null, openConflicts: 0, rejected: [], raisedConflicts: [],
  photosWaiting: 0, refusedPhotos: [], waitingElsewhere: [], running: false, progress: null, storage: 'persisted',
};

describe('sync status words', () => {
  it('says how long ago, in whole units', () => {
    expect(relativeTime('2026-12-06T08:59:30Z', NOW)).toBe('just now');
    expect(relativeTime('2026-12-06T08:59:00Z', NOW)).toBe('1 minute ago');
    expect(relativeTime('2026-12-06T06:10:00Z', NOW)).toBe('2 hours ago');
    expect(relativeTime('2026-12-03T08:00:00Z', NOW)).toBe('3 days ago');
    expect(relativeTime('2026-12-06T09:05:00Z', NOW)).toBe('just now');
  });

  it('counts changes waiting and shows progress as n of m', () => {
    expect(waitingText(0)).toBe('All changes sent');
    expect(waitingText(1)).toBe('1 change waiting to be sent');
    expect(progressText({ running: true, progress: { phase: 'sending', done: 500, total: 1200 } })).toBe('Sending changes: 500 of 1,200');
    expect(progressText({ running: true, progress: { phase: 'receiving', done: 2000, more: true } })).toBe('Receiving changes: 2,000 so far');
    expect(progressText({ running: true, progress: { phase: 'receiving', done: 2000, more: true, total: 20000 } })).toBe('Receiving changes: 2,000 of about 20,000');
    expect(progressText({ running: false, progress: null })).toBeNull();
    expect(lastSyncText(null, NOW)).toBe('Not synced yet on this phone');
  });

  it('says when changes wait for another of the person\'s clubs, and how to send them', () => {
    expect(elsewhereText(1, 'Kelp Reef Surf Lifesaving Club')).toBe('1 change for Kelp Reef Surf Lifesaving Club waits on this phone: switch to that club to send it.');
    expect(elsewhereText(3, undefined)).toBe('3 changes for another club wait on this phone: switch to that club to send them.');
    const elsewhere = { ...idle, lastSyncAt: '2026-12-06T08:59:30Z', waitingElsewhere: [{ clubId: 'c-2', count: 3 }] };
    expect(headline(elsewhere, NOW)).toBe('Changes waiting for another club');
    // This club's own queue comes first.
    expect(headline({ ...elsewhere, waiting: 2 }, NOW)).toBe('2 changes waiting to be sent');
  });

  it('counts photos waiting and shows their upload as n of m', () => {
    expect(photosWaitingText(0)).toBeNull();
    expect(photosWaitingText(1)).toBe('1 photo waiting to be sent');
    expect(progressText({ running: true, progress: { phase: 'photos', done: 2, total: 5 } })).toBe('Sending photos: 2 of 5');
    expect(headline({ ...idle, photosWaiting: 2 }, NOW)).toBe('2 photos waiting to be sent');
    // Changes come first: photos go after the records that refer to them.
    expect(headline({ ...idle, waiting: 1, photosWaiting: 2 }, NOW)).toBe('1 change waiting to be sent');
    const failure = { reason: 'photos' as const, message: 'Photos not sent yet: the store is down.', at: '2026-12-06T08:00:00Z' };
    expect(headline({ ...idle, photosWaiting: 2, lastError: failure }, NOW)).toBe('Photos not sent');
  });

  it('puts a failure before the count, and the count before the last sync', () => {
    const failure = { reason: 'signed-out' as const, message: 'Signed out. Sign in again.', at: '2026-12-06T08:00:00Z' };
    expect(headline({ ...idle, waiting: 3, lastError: failure }, NOW)).toBe('Signed out');
    expect(headline({ ...idle, waiting: 3 }, NOW)).toBe('3 changes waiting to be sent');
    expect(headline({ ...idle, lastSyncAt: '2026-12-06T08:30:00Z' }, NOW)).toBe('Last synced 30 minutes ago');
  });

  it('names the record kind and fields of a refused change', () => {
    const base = { mutationId: 'm', clubId: 'c', recordId: 'r', kind: 'trip' as const, error: { code: 'forbidden' as const, message: 'x' }, at: '' };
    expect(rejectedTitle({ ...base, patch: { windSpeedKn: 30 } })).toBe('Your change to a trip (wind speed (knots)) was not saved.');
    expect(rejectedTitle({ ...base, patch: {}, deleted: true })).toBe('Deleting a trip was not done.');
  });
});
