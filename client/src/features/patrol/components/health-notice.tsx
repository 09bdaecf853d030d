import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';

/** Said on every incident note form: what the note holds, who sees it, and what it is not. */
export function HealthNotice({ clubName }: { clubName: string }) {
  return (
    <Alert severity="info" icon={false} sx={{ border: 1, borderColor: 'info.main' }}>
      <AlertTitle sx={{ fontWeight: 700 }}>This note can hold health information</AlertTitle>
      Write only what is needed to describe what happened and what was done; leave out names and details nobody needs.
      Only you and the drivers, supervisors and admins of {clubName} can see it. It does not replace the incident report
      your governing body requires: make that report as your club's procedures and local law say.
    </Alert>
  );
}
