import Chip from '@mui/material/Chip';
import Box from '@mui/material/Box';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { useSession } from '@/features/auth/use-auth';
import { useConflicts } from '../api/conflicts';
import { tabsFor, TAB_LABELS, type DeskTab } from '../model/desk-query';

export type DeskScreen = DeskTab | 'day' | 'conflicts';

/** The desk's screens as one row of tabs: the four tables, the day's log and the conflicts. */
export function DeskNav({ current }: { current: DeskScreen }) {
  const { activeClub } = useSession();
  const open = useConflicts('open');
  const count = open.data?.length ?? 0;
  return (
    <Box sx={{ borderBottom: 1, borderColor: 'divider', mb: 2 }}>
      <Tabs value={current} variant="scrollable" scrollButtons={false} aria-label="Review desk screens">
        {tabsFor(activeClub.role).map((t) => (
          <Tab key={t} value={t} label={TAB_LABELS[t]} component={RouterLink} to={`${paths.reviewDesk.href()}?tab=${t}`} />
        ))}
        <Tab value="day" label="Day's log" component={RouterLink} to={paths.deskDay.href()} />
        <Tab
          value="conflicts"
          component={RouterLink}
          to={paths.deskConflicts.href()}
          aria-label={count > 0 ? `Conflicts, ${count} open` : 'Conflicts'}
          label={
            <span>
              Conflicts{count > 0 && <Chip component="span" size="small" color="error" label={`${count} open`} sx={{ ml: 1, height: 22 }} />}
            </span>
          }
        />
      </Tabs>
    </Box>
  );
}
