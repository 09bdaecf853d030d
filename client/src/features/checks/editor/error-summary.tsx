import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import { errorPlace, type TemplateDraft, type TemplateErrors } from './template-draft';

/** Everything to fix before the template can be saved, each a link to its place in the form. */
export function ErrorSummary({ draft, errors, onGo }: { draft: TemplateDraft; errors: TemplateErrors; onGo: (path: string) => void }) {
  const entries = Object.entries(errors);
  if (entries.length === 0) return null;
  const go = onGo;
  return (
    <Alert severity="error" role="alert">
      <AlertTitle>Not saved yet: {entries.length === 1 ? 'one thing needs' : `${entries.length} things need`} fixing</AlertTitle>
      Nothing you typed is lost.
      {entries.map(([path, message]) => (
        <Button key={path} size="small" color="inherit" onClick={() => go(path)} sx={{ display: 'block', textAlign: 'left', textTransform: 'none', minHeight: 40 }}>
          {errorPlace(draft, path)}: {message}
        </Button>
      ))}
    </Alert>
  );
}
