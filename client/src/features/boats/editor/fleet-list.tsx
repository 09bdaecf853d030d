import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { roleAtLeast } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { PageHeader } from '@/components/page-header';
import { useRecords } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import { useNow } from '../hooks/use-now';
import { motorService } from '../service/motor-service';
import { ServiceStateLine } from '../service/service-state-line';

/** The club's boats and motors, to open and (for supervisors and admins) edit or add. */
export function FleetList() {
  const boats = useRecords('boat') ?? [];
  const motors = useRecords('motor') ?? [];
  const serviceRecords = useRecords('serviceRecord') ?? [];
  const trips = useRecords('trip') ?? [];
  const now = useNow();
  const { activeClub } = useSession();
  const editor = roleAtLeast(activeClub.role, 'supervisor');
  const boatName = (id: string | null) => boats.find((b) => b.id === id)?.fields.name;
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <PageHeader title="Fleet" subtitle={editor ? 'Boats and motors: add, edit, move motors' : 'Boats and motors (read only)'} />
      <Typography variant="h6" component="h2">Boats</Typography>
      <Paper variant="outlined">
        <List disablePadding aria-label="Boats">
          {boats.map((b) => (
            <ListItemButton key={b.id} component={RouterLink} to={paths.boatEdit.href(b.id)}>
              <ListItemText primary={`${b.fields.fleetNumber} · ${b.fields.name}`} secondary={`${b.fields.airChambers.length} air chambers${b.fields.inService ? '' : ' · out of service'}`} />
            </ListItemButton>
          ))}
          {boats.length === 0 && <ListItemText sx={{ p: 2 }} primary="No boats yet." />}
        </List>
      </Paper>
      {editor && <Button component={RouterLink} to={paths.boatEdit.href()} variant="outlined" size="large">Add a boat</Button>}
      <Typography variant="h6" component="h2">Motors</Typography>
      <Paper variant="outlined">
        <List disablePadding aria-label="Motors">
          {motors.map((m) => (
            <ListItemButton key={m.id} component={RouterLink} to={paths.motorEdit.href(m.id)}>
              <ListItemText
                primary={`${m.fields.model} · ${m.fields.serial}`}
                secondary={
                  <>
                    {m.fields.boatId ? `Fitted to ${boatName(m.fields.boatId) ?? 'a boat not on this phone'}` : 'In the store'}
                    <ServiceStateLine component="span" status={motorService(m, { serviceRecords, trips }, now, activeClub.timeZone).status} />
                  </>
                }
                slotProps={{ secondary: { component: 'span', sx: { display: 'grid' } } }}
              />
            </ListItemButton>
          ))}
          {motors.length === 0 && <ListItemText sx={{ p: 2 }} primary="No motors yet." />}
        </List>
      </Paper>
      {editor && <Button component={RouterLink} to={paths.motorEdit.href()} variant="outlined" size="large">Add a motor</Button>}
    </Box>
  );
}
