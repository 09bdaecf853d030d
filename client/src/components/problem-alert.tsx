import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import { isApiError } from '@/lib/api-error';

/** What to do next, for an answer that is not the server's own sentence. */
function advice(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong in Breakline. Reload the page; if it keeps happening, tell your club admin.';
  if (error.code === 'network_error') return error.message;
  if (error.status === 403) return `${error.message} If you think you should have access, ask your club admin to check your role.`;
  if (error.status === 404 && error.message === 'Nothing was found at this address.') {
    return 'The server does not offer this screen yet. Ask your club admin to update Breakline on the server.';
  }
  return error.message;
}

/** An error in plain words, with what to do and, where trying again can help, a button for it. */
export function ProblemAlert({ title, error, onRetry }: { title: string; error: unknown; onRetry?: () => void }) {
  // A 4xx answer will not change by asking again; a network failure, a server fault or a failed job may.
  const retryable = !isApiError(error) || error.status < 400 || error.status >= 500;
  return (
    <Alert
      severity="error"
      action={onRetry && retryable ? <Button color="inherit" onClick={onRetry}>Try again</Button> : undefined}
    >
      <AlertTitle>{title}</AlertTitle>
      {advice(error)}
    </Alert>
  );
}
