import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import { utcToLocal } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import type { LocalRecord } from '@/db/types';
import { CHECK_NAMES } from './check-names';

function outcome(check: LocalRecord<'check'>): string {
  const results = Object.values(check.fields.results);
  const failed = results.filter((r) => r.outcome === 'fail').length;
  if (check.fields.status === 'in-progress') return `in progress, ${results.length} answered`;
  return failed === 0 ? 'nothing failed' : failed === 1 ? '1 item failed' : `${failed} items failed`;
}

/** One check in a list: which, which boat, when, and how it went. */
export function CheckRow({ check, boatName, zone }: { check: LocalRecord<'check'>; boatName: string | undefined; zone: string }) {
  const c = check.fields;
  const at = utcToLocal(c.completedAt ?? c.startedAt, zone);
  const waiting = check.waiting > 0 ? ' · waiting to sync' : '';
  return (
    <ListItemButton component={RouterLink} to={paths.checkRun.href(check.id)}>
      <ListItemText
        primary={`${CHECK_NAMES[c.checkType]}${boatName ? ` · ${boatName}` : ''}`}
        secondary={`${at.date} ${at.time} · ${outcome(check)}${c.signedOffAt ? ' · signed off' : ''}${waiting}`}
      />
    </ListItemButton>
  );
}
