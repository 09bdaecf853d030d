import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import CircularProgress from '@mui/material/CircularProgress';
import Link from '@mui/material/Link';
import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { EmptyState } from '@/components/empty-state';
import { ProblemAlert } from '@/components/problem-alert';
import { useSession } from '@/features/auth/use-auth';
import { useCaughtMail } from '../api/caught-mail';

function when(iso: string, zone: string) {
  const ms = Date.parse(iso);
  return Number.isFinite(ms)
    ? new Intl.DateTimeFormat('en-AU', { timeZone: zone, day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', second: '2-digit', hourCycle: 'h23' }).format(ms)
    : iso;
}

/** The e-mails the local mail catcher caught for this club's people: development and tests only. */
export function CaughtMailScreen() {
  const { activeClub } = useSession();
  const mail = useCaughtMail();
  const [openId, setOpenId] = useState<string | null>(null);
  const open = mail.data?.find((m) => m.id === openId) ?? mail.data?.[0];
  return (
    <Stack spacing={2}>
      <Alert severity="info">
        This server runs with a local mail catcher: nothing here left the machine. Invitation and password links can be
        opened from here. A server that sends real e-mail does not have this page.
      </Alert>
      {mail.error && <ProblemAlert title="The caught mail could not be loaded" error={mail.error} onRetry={() => void mail.refetch()} />}
      {mail.isPending && <CircularProgress aria-label="Loading the caught mail" />}
      {mail.data && mail.data.length === 0 && <EmptyState title="No mail caught yet">Invitations, password resets and stand-down alerts show here as they are sent.</EmptyState>}
      {mail.data && mail.data.length > 0 && (
        <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: 'minmax(260px, 1fr) 2fr' }, gap: 2 }}>
          <Paper variant="outlined">
            <List aria-label="Caught e-mails" disablePadding>
              {mail.data.map((m) => (
                <ListItemButton key={m.id} selected={open?.id === m.id} onClick={() => setOpenId(m.id)}>
                  <ListItemText primary={m.subject || '(no subject)'} secondary={`${m.to.join(', ')} · ${when(m.at, activeClub.timeZone)}`} />
                </ListItemButton>
              ))}
            </List>
          </Paper>
          {open && (
            <Paper variant="outlined" sx={{ p: 2 }} component="article" aria-label="The e-mail">
              <Typography variant="h6" component="h2">{open.subject || '(no subject)'}</Typography>
              <Typography color="text.secondary">To {open.to.join(', ')} · {when(open.at, activeClub.timeZone)}</Typography>
              <Typography component="pre" sx={{ whiteSpace: 'pre-wrap', overflowWrap: 'anywhere', fontFamily: 'inherit', mt: 2 }}>
                {linkify(open.text)}
              </Typography>
            </Paper>
          )}
        </Box>
      )}
    </Stack>
  );
}

/** Links in a caught mail's text become links, so an invitation can be followed from here. */
function linkify(text: string) {
  return text.split(/(https?:\/\/\S+)/g).map((part, i) =>
    /^https?:\/\//.test(part) ? <Link key={i} href={part}>{part}</Link> : part);
}
