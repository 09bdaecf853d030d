import { useState, type FormEvent } from 'react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { isApiError } from '@/lib/api-error';
import { PasswordField } from '../components/password-field';
import { useAcceptInvite, useConfirmPasswordReset, useRequestPasswordReset } from './api';
import { MIN_PASSWORD_LENGTH, newPasswordProblems } from './validate';
import { emailShape } from '../components/validate-sign-in';

const OFFLINE = 'No connection to the Breakline server. This step needs the internet; try again on the clubhouse Wi-Fi.';

function errorText(error: unknown): string {
  if (isApiError(error, 'network_error')) return OFFLINE;
  if (error instanceof Error) return error.message;
  return 'That did not work. Try again.';
}

/** A password being chosen, typed twice. */
function NewPasswordPair(props: {
  labels: [string, string];
  password: string;
  repeat: string;
  onPassword: (v: string) => void;
  onRepeat: (v: string) => void;
  problems: Record<string, string | undefined>;
}) {
  const { labels, problems } = props;
  return (
    <>
      <PasswordField
        label={labels[0]}
        autoComplete="new-password"
        value={props.password}
        onChange={(e) => props.onPassword(e.target.value)}
        error={Boolean(problems.password)}
        helperText={problems.password ?? `At least ${MIN_PASSWORD_LENGTH} characters.`}
        fullWidth
      />
      <PasswordField
        label={labels[1]}
        autoComplete="new-password"
        value={props.repeat}
        onChange={(e) => props.onRepeat(e.target.value)}
        error={Boolean(problems.repeat)}
        helperText={problems.repeat}
        fullWidth
      />
    </>
  );
}

/** Joining a club from an e-mailed invitation: a new account, or an existing one's password. */
export function AcceptInviteForm({ token, onDone }: { token: string; onDone: () => void }) {
  const [existing, setExisting] = useState(false);
  const [displayName, setDisplayName] = useState('');
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [problems, setProblems] = useState<Record<string, string | undefined>>({});
  const accept = useAcceptInvite();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (accept.isPending) return;
    const found: Record<string, string | undefined> = existing
      ? password === '' ? { password: 'Enter the password of your Breakline account.' } : {}
      : { ...newPasswordProblems({ password, repeat }), ...(displayName.trim() === '' ? { displayName: 'Enter your name as the club knows you.' } : {}) };
    setProblems(found);
    if (Object.values(found).some(Boolean)) return;
    accept.mutate(existing ? { token, password } : { token, password, displayName: displayName.trim() }, {
      onSuccess: onDone,
      onError: (error) => {
        if (isApiError(error)) setProblems({ displayName: error.fieldMessage('displayName'), password: error.fieldMessage('password') });
      },
    });
  };

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2.5} aria-busy={accept.isPending}>
      {accept.isError && <Alert severity="error">{errorText(accept.error)}</Alert>}
      <FormControlLabel
        control={<Checkbox checked={existing} onChange={(e) => setExisting(e.target.checked)} />}
        label="I already have a Breakline account with this e-mail address"
      />
      {!existing && (
        <TextField
          label="Your name"
          autoComplete="name"
          value={displayName}
          onChange={(e) => setDisplayName(e.target.value)}
          error={Boolean(problems.displayName)}
          helperText={problems.displayName ?? 'Shown to your club on checks, trips and defects.'}
          fullWidth
        />
      )}
      {existing ? (
        <PasswordField
          label="Your password"
          autoComplete="current-password"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          error={Boolean(problems.password)}
          helperText={problems.password}
          fullWidth
        />
      ) : (
        <NewPasswordPair
          labels={['Choose a password', 'Type the password again']}
          password={password}
          repeat={repeat}
          onPassword={setPassword}
          onRepeat={setRepeat}
          problems={problems}
        />
      )}
      <Button type="submit" variant="contained" size="large" disabled={accept.isPending}>
        {accept.isPending ? 'Joining…' : 'Join the club'}
      </Button>
    </Stack>
  );
}

/** Asking for a reset link; the answer is the same whether or not the address is known. */
export function ForgotPasswordForm() {
  const [email, setEmail] = useState('');
  const [problem, setProblem] = useState<string | undefined>();
  const request = useRequestPasswordReset();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const trimmed = email.trim();
    if (!emailShape.test(trimmed)) {
      setProblem('Enter an e-mail address like name@example.org.');
      return;
    }
    setProblem(undefined);
    request.mutate(trimmed);
  };
  if (request.isSuccess) {
    return (
      <Alert severity="success">
        If {email.trim()} belongs to a Breakline account, a link to choose a new password is on its way. It works once and
        expires; check your spam folder if it does not arrive in a few minutes.
      </Alert>
    );
  }
  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2}>
      {request.isError && <Alert severity="error">{errorText(request.error)}</Alert>}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        value={email}
        onChange={(e) => setEmail(e.target.value)}
        error={Boolean(problem)}
        helperText={problem}
        slotProps={{ htmlInput: { inputMode: 'email', autoCapitalize: 'none', spellCheck: false } }}
        fullWidth
      />
      <Button type="submit" variant="outlined" size="large" disabled={request.isPending}>
        {request.isPending ? 'Sending…' : 'E-mail me a link'}
      </Button>
    </Stack>
  );
}

/** Choosing a new password from an e-mailed reset link; it signs in and ends other sign-ins. */
export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [problems, setProblems] = useState<Record<string, string | undefined>>({});
  const confirm = useConfirmPasswordReset();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (confirm.isPending) return;
    const found = newPasswordProblems({ password, repeat });
    setProblems(found);
    if (Object.values(found).some(Boolean)) return;
    confirm.mutate({ token, password }, { onSuccess: onDone });
  };
  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2.5}>
      {confirm.isError && <Alert severity="error">{errorText(confirm.error)}</Alert>}
      <Typography variant="body2" color="text.secondary">
        Other phones and computers signed in as you will be asked to sign in again. Changes they hold are kept and sent
        once they do.
      </Typography>
      <NewPasswordPair labels={['New password', 'Type it again']} password={password} repeat={repeat} onPassword={setPassword} onRepeat={setRepeat} problems={problems} />
      <Button type="submit" variant="contained" size="large" disabled={confirm.isPending}>
        {confirm.isPending ? 'Saving…' : 'Save the new password'}
      </Button>
    </Stack>
  );
}
