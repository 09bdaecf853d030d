import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import type { Readiness } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { nextAction } from '../state/next-action';

/** What to do next with the boat, with the check to open when that is the next step. */
export function NextActionBar({ boatId, readiness }: { boatId: string; readiness: Readiness }) {
  const action = nextAction(readiness);
  const carryOn = readiness.reasons.some((r) => r.startsWith('unchecked: launch check in progress'));
  const label = action.check === 'stow' ? 'Run the stow check' : carryOn ? 'Carry on with the launch check' : 'Run the launch check';
  const main = readiness.state === 'unchecked';
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      {action.warning ? (
        <Alert severity="error" variant="filled" sx={{ fontWeight: 700 }}>{action.text}</Alert>
      ) : (
        action.text !== label && <Typography sx={{ fontWeight: 500 }}>{action.text}</Typography>
      )}
      {action.check && (
        <Button component={RouterLink} to={paths.checkStart.href({ type: action.check, boatId })} variant={main ? 'contained' : 'outlined'} size="large" fullWidth>
          {label}
        </Button>
      )}
    </Box>
  );
}
