import type { ReactNode } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useLocation, useNavigate } from 'react-router-dom';
import { AcceptInviteForm, ForgotPasswordForm, ResetPasswordForm } from '@/features/auth/links/link-forms';
import { tokenFromHash } from '@/features/auth/links/api';
import { paths } from '../paths';

function Frame({ title, intro, children }: { title: string; intro: string; children: ReactNode }) {
  return (
    <Box sx={{ minHeight: '100dvh', display: 'grid', placeItems: 'center', p: 2 }}>
      <Paper component="main" sx={{ p: { xs: 3, sm: 4 }, width: '100%', maxWidth: 440 }}>
        <Typography variant="h5" component="h1" sx={{ fontWeight: 700, mb: 1 }}>
          {title}
        </Typography>
        <Typography color="text.secondary" sx={{ mb: 3 }}>
          {intro}
        </Typography>
        {children}
        <Typography variant="body2" sx={{ mt: 3 }}>
          <Link component={RouterLink} to={paths.signIn.href()}>
            Back to sign-in
          </Link>
        </Typography>
      </Paper>
    </Box>
  );
}

const NO_TOKEN =
  'This address is missing the part of the link that identifies you. Open the link from the e-mail again, in full, or ask your club admin for a new one.';

export function AcceptInvitePage() {
  const token = tokenFromHash(useLocation().hash);
  const navigate = useNavigate();
  return (
    <Frame title="Join your club on Breakline" intro="Your club has invited you. Set up how you sign in; it takes a minute.">
      {token ? <AcceptInviteForm token={token} onDone={() => navigate(paths.today.href(), { replace: true })} /> : <Alert severity="warning">{NO_TOKEN}</Alert>}
    </Frame>
  );
}

export function ResetPasswordPage() {
  const token = tokenFromHash(useLocation().hash);
  const navigate = useNavigate();
  return (
    <Frame title="Choose a new password" intro="The link in your e-mail works once and for a limited time.">
      {token ? <ResetPasswordForm token={token} onDone={() => navigate(paths.today.href(), { replace: true })} /> : <Alert severity="warning">{NO_TOKEN}</Alert>}
    </Frame>
  );
}

export function ForgotPasswordPage() {
  return (
    <Frame title="Forgotten password" intro="We will e-mail you a link to choose a new one.">
      <ForgotPasswordForm />
    </Frame>
  );
}
