import { useSyncExternalStore } from 'react';
import Button from '@mui/material/Button';
import Snackbar from '@mui/material/Snackbar';
import { pwaUpdates } from './pwa';

/** Offers a waiting new version; it stays until the person reloads (no auto-hide). */
export function UpdatePrompt() {
  const update = useSyncExternalStore(pwaUpdates.subscribe, pwaUpdates.getSnapshot);
  return (
    <Snackbar
      open={update !== null}
      message="A new version of Breakline is ready"
      anchorOrigin={{ vertical: 'top', horizontal: 'center' }}
      action={
        <Button color="inherit" onClick={() => update?.apply()}>
          Reload
        </Button>
      }
    />
  );
}
