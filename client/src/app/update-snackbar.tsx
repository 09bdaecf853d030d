import Button from '@mui/material/Button';
import Snackbar from '@mui/material/Snackbar';
import type { PendingUpdate } from './pwa';

export default function UpdateSnackbar({ update }: { update: PendingUpdate }) {
  return (
    <Snackbar
      open
      message="A new version of Breakline is ready"
      anchorOrigin={{ vertical: 'top', horizontal: 'center' }}
      action={
        <Button color="inherit" onClick={() => update.apply()}>
          Reload
        </Button>
      }
    />
  );
}
