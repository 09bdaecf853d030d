import Alert from '@mui/material/Alert';

export function ReadOnlyNote({ what }: { what: string }) {
  return (
    <Alert severity="info">
      You can read {what} here. Only a supervisor or admin may change the fleet; ask one if something is wrong.
    </Alert>
  );
}
