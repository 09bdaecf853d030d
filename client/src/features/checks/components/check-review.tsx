import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { utcToLocal } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import type { LocalRecord } from '@/db/types';
import { failedItems, unansweredItems } from '../model/progress';
import type { TemplateFields } from '../model/types';
import { CHECK_NAMES } from './check-names';

interface Props {
  check: LocalRecord<'check'>;
  template: TemplateFields;
  zone: string;
  refusal: string | null;
  onFinish: () => void;
  goTo: (section: number) => void;
}

/** The last screen: what is left, what failed and what that means, then Finish. */
export function CheckReview({ check, template, zone, refusal, onFinish, goTo }: Props) {
  const c = check.fields;
  const open = unansweredItems(template, c.results);
  const failed = failedItems(template, c.results);
  const sectionOf = (id: string) => template.sections.findIndex((s) => s.items.some((i) => i.id === id));
  const name = CHECK_NAMES[c.checkType];
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Typography variant="h5" component="h2" sx={{ fontWeight: 700 }}>{c.status === 'complete' ? `${name} complete` : 'Review and finish'}</Typography>
      {c.completedAt && <Typography>Completed at {utcToLocal(c.completedAt, zone).time} on {utcToLocal(c.completedAt, zone).date}.</Typography>}
      {open.length > 0 && (
        <Alert severity="info">
          {open.length === 1 ? '1 item is' : `${open.length} items are`} not answered yet:
          {open.map((i) => (
            <Button key={i.id} size="small" sx={{ display: 'block', textAlign: 'left' }} onClick={() => goTo(sectionOf(i.id))}>{i.label}</Button>
          ))}
        </Alert>
      )}
      {failed.length === 0 && open.length === 0 && <Alert severity="success">Every item passed or does not apply.</Alert>}
      {failed.map((i) => (
        <Alert key={i.id} severity={i.critical ? 'error' : 'warning'}>
          {i.label} failed: {i.critical ? 'this stands the boat down. Do not launch.' : 'this limits the boat.'}
        </Alert>
      ))}
      {refusal && <Alert severity="error">{refusal}</Alert>}
      {c.status === 'in-progress' ? (
        <Button variant="contained" size="large" disabled={open.length > 0} onClick={onFinish} sx={{ minHeight: 56 }}>Finish {name.toLowerCase()}</Button>
      ) : (
        <Button component={RouterLink} to={paths.boatFile.href(c.boatId)} variant="contained" size="large">Open the boat file</Button>
      )}
      <Button component={RouterLink} to={paths.today.href()} size="large">Back to Today</Button>
    </Box>
  );
}
