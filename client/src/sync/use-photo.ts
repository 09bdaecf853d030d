import { useEffect, useState, useSyncExternalStore } from 'react';
import { useLiveQuery } from 'dexie-react-hooks';
import { photoBlob } from '@/db/photos';
import type { ReplicaDb } from '@/db/schema';
import { syncActivity } from './activity';
import { sessionAuth, type SyncAuth } from './auth-source';
import { fetchPhoto, type FetchOutcome } from './photo-fetch';

export interface PhotoSource {
  auth: SyncAuth;
  fetch?: typeof fetch;
}

/** What a thumbnail shows: the photo, or a plain placeholder with a short line and the full reason. */
export type PhotoView =
  | { status: 'shown'; url: string }
  | { status: 'placeholder'; text: string; detail: string };

const PLACEHOLDER: Record<Exclude<FetchOutcome['status'], 'kept'> | 'fetching', { text: string; detail: string }> = {
  fetching: { text: 'Fetching photo…', detail: 'This photo was taken on another phone; it is being fetched.' },
  offline: { text: 'Photo shows when there is signal', detail: 'This photo was taken on another phone. It is fetched and kept here once this phone has signal.' },
  'not-sent': { text: 'Photo not sent yet by its phone', detail: 'The phone that took this photo has not sent it yet. It shows here after that phone syncs.' },
  'signed-out': { text: 'Sign in to see this photo', detail: 'Sign in again to fetch this photo from the club.' },
  failed: { text: 'Photo could not be fetched', detail: 'The photo could not be fetched just now.' },
};

const defaultSource: PhotoSource = { auth: sessionAuth };

/** Bumps when a sync ends or the phone comes online: the moments a missing photo may have become reachable. */
function useRetryTick(): number {
  const running = useSyncExternalStore(syncActivity.subscribe, () => syncActivity.getSnapshot().running);
  const [online, setOnline] = useState(0);
  useEffect(() => {
    const bump = () => setOnline((n) => n + 1);
    window.addEventListener('online', bump);
    return () => window.removeEventListener('online', bump);
  }, []);
  return running ? -1 : online;
}

/**
 * A photo by its hash: from this phone when it is here; otherwise fetched from the server on
 * demand and kept, with a placeholder saying why while it is not (no signal, not sent yet).
 */
export function usePhoto(db: ReplicaDb, sha256: string, source: PhotoSource = defaultSource): PhotoView {
  const row = useLiveQuery(() => db.photos.get(sha256).then((r) => r ?? null), [db, sha256]);
  const [url, setUrl] = useState<string | null>(null);
  const [outcome, setOutcome] = useState<FetchOutcome | 'fetching'>('fetching');
  const tick = useRetryTick();

  useEffect(() => {
    if (!row || typeof URL.createObjectURL !== 'function') return;
    const made = URL.createObjectURL(photoBlob(row));
    setUrl(made);
    return () => {
      URL.revokeObjectURL(made);
      setUrl(null);
    };
  }, [row]);

  useEffect(() => {
    if (row !== null || tick < 0) return; // loading, here already, or a sync is running: wait for it
    const scope = source.auth.scope();
    if (!scope) {
      setOutcome({ status: 'signed-out' });
      return;
    }
    let live = true;
    setOutcome('fetching');
    void fetchPhoto({ db, scope, auth: source.auth, fetch: source.fetch }, sha256).then((o) => live && setOutcome(o));
    return () => {
      live = false;
    };
  }, [db, sha256, row, tick, source]);

  if (url) return { status: 'shown', url };
  // Here, but this browser cannot draw it from memory (no object URLs).
  if (row) return { status: 'placeholder', text: 'Photo', detail: 'The photo is on this phone.' };
  if (row === undefined || outcome === 'fetching' || outcome.status === 'kept') return { status: 'placeholder', ...PLACEHOLDER.fetching };
  if (outcome.status === 'failed') return { status: 'placeholder', text: PLACEHOLDER.failed.text, detail: outcome.message };
  return { status: 'placeholder', ...PLACEHOLDER[outcome.status] };
}
