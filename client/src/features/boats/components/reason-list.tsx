import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import Typography from '@mui/material/Typography';
import { reasonSentence } from '../state/state-meta';

/** Why the boat is in its state, one plain sentence a line. */
export function ReasonList({ reasons, label }: { reasons: readonly string[]; label: string }) {
  return (
    <List dense disablePadding aria-label={label} sx={{ listStyle: 'disc', pl: 2.5 }}>
      {reasons.map((reason) => (
        <ListItem key={reason} disableGutters sx={{ display: 'list-item', py: 0.25 }}>
          <Typography variant="body2">{reasonSentence(reason)}</Typography>
        </ListItem>
      ))}
    </List>
  );
}
