import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import List from '@mui/material/List';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { OPEN_DEFECT_STATUSES } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { EmptyState } from '@/components/empty-state';
import { useRecords } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { useSession } from '@/features/auth/use-auth';
import { SEVERITY_RANK } from '../model/words';
import { DefectRow } from './defect-row';

const isOpen = (d: LocalRecord<'defect'>) => OPEN_DEFECT_STATUSES.includes(d.fields.status);
const byUrgency = (a: LocalRecord<'defect'>, b: LocalRecord<'defect'>) =>
  SEVERITY_RANK[a.fields.severity] - SEVERITY_RANK[b.fields.severity] || b.fields.reportedAt.localeCompare(a.fields.reportedAt);

/** Every defect on this phone: open ones first, worst first; closed ones after, newest first. */
export function DefectList() {
  const defects = useRecords('defect') ?? [];
  const boats = useRecords('boat') ?? [];
  const { activeClub } = useSession();
  const open = defects.filter(isOpen).sort(byUrgency);
  const closed = defects.filter((d) => !isOpen(d)).sort((a, b) => b.fields.reportedAt.localeCompare(a.fields.reportedAt)).slice(0, 50);
  const name = (id: string) => boats.find((b) => b.id === id)?.fields.name;
  const group = (title: string, list: LocalRecord<'defect'>[]) =>
    list.length > 0 && (
      <Paper component="section" aria-label={title} variant="outlined">
        <Typography variant="h6" component="h2" sx={{ px: 2, pt: 1.5 }}>{title}</Typography>
        <List disablePadding>{list.map((d) => <DefectRow key={d.id} defect={d} boatName={name(d.fields.boatId)} zone={activeClub.timeZone} />)}</List>
      </Paper>
    );
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Button component={RouterLink} to={paths.defectNew.href()} variant="contained" color="error" size="large" sx={{ minHeight: 56 }}>Report a defect</Button>
      {group('Open', open)}
      {group('Closed', closed)}
      {defects.length === 0 && (
        <EmptyState title="No defects reported">
          Defects reported on any of the club's boats show here with their severity, photos and where they are on the way from
          open to verified. A stood-down boat is not launched until a competent person returns it to service.
        </EmptyState>
      )}
    </Box>
  );
}
