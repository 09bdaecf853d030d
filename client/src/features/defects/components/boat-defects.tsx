import List from '@mui/material/List';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { OPEN_DEFECT_STATUSES } from '@breakline/sync-protocol';
import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { useRecords } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import { SEVERITY_RANK } from '../model/words';
import { DefectHistory } from './defect-history';
import { DefectRow } from './defect-row';

/** A boat's open defects and what was done about each: what the next crew reads when signing on. */
export function BoatDefects({ boatId, boatName }: { boatId: string; boatName: string }) {
  const loaded = useRecords('defect', { boatId });
  const { activeClub } = useSession();
  if (!loaded) return null;
  const defects = loaded;
  const open = defects.filter((d) => OPEN_DEFECT_STATUSES.includes(d.fields.status)).sort((a, b) => SEVERITY_RANK[a.fields.severity] - SEVERITY_RANK[b.fields.severity]);
  const closed = defects.filter((d) => d.fields.status === 'verified').sort((a, b) => (b.fields.verifiedAt ?? '').localeCompare(a.fields.verifiedAt ?? '')).slice(0, 3);
  return (
    <Paper component="section" aria-label="Defects" variant="outlined" sx={{ p: 2, display: 'grid', gap: 1 }}>
      <Typography variant="h6" component="h2" sx={{ fontWeight: 700 }}>{open.length ? `Open defects (${open.length})` : 'No open defects'}</Typography>
      <List disablePadding>
        {open.map((d) => (
          <li key={d.id}>
            <DefectRow defect={d} boatName={boatName} zone={activeClub.timeZone} />
            <DefectHistory d={d.fields} zone={activeClub.timeZone} />
          </li>
        ))}
      </List>
      {closed.length > 0 && <Typography variant="subtitle1" component="h3" sx={{ fontWeight: 700 }}>Recently repaired and verified</Typography>}
      <List disablePadding>
        {closed.map((d) => (
          <li key={d.id}>
            <DefectRow defect={d} boatName={boatName} zone={activeClub.timeZone} />
          </li>
        ))}
      </List>
      <Button component={RouterLink} to={paths.defectNew.href(boatId)} variant="outlined" color="error" size="large">Report a defect on {boatName}</Button>
    </Paper>
  );
}
