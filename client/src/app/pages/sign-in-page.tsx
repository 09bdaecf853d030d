import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import Link from '@mui/material/Link';
import { Link as RouterLink, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import Button from '@mui/material/Button';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { useDeviceMembers } from '@/features/auth/members/use-members';
import { useAuthState } from '@/features/auth/use-auth';
import { paths, safeNextPath } from '../paths';

export function SignInPage() {
  const { session, notice } = useAuthState();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  const onDevice = useDeviceMembers().length;
  // Navigation after a successful sign-in is done by the form's callback; this covers a visit while signed in.
  if (session) return <Navigate to={next} replace />;
  return (
    <Box sx={{ minHeight: '100dvh', display: 'grid', placeItems: 'center', p: 2 }}>
      <Paper component="main" sx={{ p: { xs: 3, sm: 4 }, width: '100%', maxWidth: 420 }}>
        <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, mb: 1 }}>
          <Box component="img" src="/icon.svg" alt="" sx={{ width: 44, height: 44, borderRadius: 1.5 }} />
          <Typography variant="h4" component="h1" sx={{ fontWeight: 700 }}>
            Breakline
          </Typography>
        </Box>
        <Typography color="text.secondary" sx={{ mb: 3 }}>
          Sign in with the e-mail address your club has for you.
        </Typography>
        {notice && (
          <Alert severity="info" sx={{ mb: 2 }}>
            {notice}
          </Alert>
        )}
        <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
        {onDevice > 0 && (
          <Button component={RouterLink} to={paths.members.href(next)} fullWidth size="large" sx={{ mt: 2 }}>
            Switch member: someone already signed in on this device
          </Button>
        )}
        <Typography variant="body2" color="text.secondary" sx={{ mt: 3 }}>
          Forgotten your password?{' '}
          <Link component={RouterLink} to={paths.forgotPassword.href()}>
            E-mail me a link to choose a new one
          </Link>
          .
        </Typography>
      </Paper>
    </Box>
  );
}
