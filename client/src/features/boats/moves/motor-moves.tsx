import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';
import { useRecords } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import { SectionCard } from '../components/section-card';
import { moveHistory } from './move-history';

/**
 * Where a motor has been: each move between boats with when and who. `nameOf` turns a member id
 * into a name the reader knows (the page supplies it).
 */
export function MotorMoves({ motorId, nameOf }: { motorId: string; nameOf: (memberId: string) => string }) {
  const moves = useRecords('motorMove');
  const boats = useRecords('boat');
  const { activeClub } = useSession();
  if (!moves || !boats) return null;
  const lines = moveHistory(moves, motorId, boats, activeClub.timeZone, nameOf);
  return (
    <SectionCard title="Moves between boats">
      {lines.length === 0 ? (
        <Typography sx={{ color: 'text.secondary' }}>No moves recorded for this motor.</Typography>
      ) : (
        <List disablePadding aria-label="Moves between boats">
          {lines.map((l) => (
            <ListItem key={l.id} disableGutters divider>
              <ListItemText
                primary={`From ${l.from} to ${l.to}`}
                secondary={`${l.when} · by ${l.by}${l.reason ? ` · ${l.reason}` : ''}${l.waiting ? ' · not sent yet' : ''}`}
                slotProps={{ primary: { sx: { fontWeight: 700 } } }}
              />
            </ListItem>
          ))}
        </List>
      )}
    </SectionCard>
  );
}
