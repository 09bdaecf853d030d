import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';

/** Safety reminders of a screen, before its items. The club's procedures and the manual come first. */
export function CautionList({ cautions }: { cautions: readonly string[] }) {
  if (cautions.length === 0) return null;
  return (
    <Alert severity="warning" variant="outlined" role="note" aria-label="Caution">
      <AlertTitle sx={{ fontWeight: 700 }}>Caution</AlertTitle>
      {cautions.map((c) => (
        <p key={c} style={{ margin: '0 0 0.5em' }}>{c}</p>
      ))}
    </Alert>
  );
}
