import { lazy, Suspense, useSyncExternalStore } from 'react';
import { pwaUpdates } from './pwa';

// Shown only once a new version waits, so its code is not part of the first screen.
const UpdateSnackbar = lazy(() => import('./update-snackbar'));

/** Offers a waiting new version; it stays until the person reloads (no auto-hide). */
export function UpdatePrompt() {
  const update = useSyncExternalStore(pwaUpdates.subscribe, pwaUpdates.getSnapshot);
  if (!update) return null;
  return (
    <Suspense fallback={null}>
      <UpdateSnackbar update={update} />
    </Suspense>
  );
}
