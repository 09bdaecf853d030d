import AppBar from '@mui/material/AppBar';
import Box from '@mui/material/Box';
import IconButton from '@mui/material/IconButton';
import Toolbar from '@mui/material/Toolbar';
import Typography from '@mui/material/Typography';
import LightModeOutlined from '@mui/icons-material/LightModeOutlined';
import { useSession } from '@/features/auth/use-auth';
import { SyncStatus } from '@/sync/components/sync-status';
import { useThemeMode } from '../theme-mode';
import { AccountMenu } from './account-menu';

export function TopBar({ desktop }: { desktop: boolean }) {
  const { user, activeClub } = useSession();
  const { mode, setMode } = useThemeMode();
  const sunlight = mode === 'sunlight';
  return (
    <AppBar position="fixed" sx={{ zIndex: (t) => t.zIndex.drawer + 1, pt: 'env(safe-area-inset-top)' }}>
      <Toolbar sx={{ gap: 1 }}>
        {desktop && <Box component="img" src="/icon.svg" alt="" sx={{ width: 32, height: 32, borderRadius: 1 }} />}
        <Box sx={{ minWidth: 0, flexGrow: 1 }}>
          <Typography component="div" variant="h6" sx={{ lineHeight: 1.2, fontWeight: 700 }}>
            Breakline
          </Typography>
          <Typography component="div" variant="body2" noWrap aria-label={`Active club: ${activeClub.name}`}>
            {activeClub.name}
          </Typography>
        </Box>
        {/* The person's name stays in view on a phone too: a shared phone must show who is signed in. */}
        <Typography variant="body2" noWrap sx={{ maxWidth: desktop ? 240 : '34vw', textAlign: 'right' }}>
          {user.displayName}
        </Typography>
        <SyncStatus />
        {/* No tooltip: it needs a long press on a phone, and the label is read out anyway. */}
        <IconButton
          color="inherit"
          aria-label="Sunlight theme"
          aria-pressed={sunlight}
          title={sunlight ? 'Standard colours' : 'Sunlight colours (high contrast)'}
          onClick={() => setMode(sunlight ? 'standard' : 'sunlight')}
        >
          <LightModeOutlined />
        </IconButton>
        <AccountMenu />
      </Toolbar>
    </AppBar>
  );
}
