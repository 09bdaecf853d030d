import { useState, type FormEvent } from 'react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { isApiError } from '@/lib/api-error';
import { useLogin } from '../api/login';
import type { SessionAnswer } from '../api/types';
import { PasswordField } from './password-field';
import { validateSignIn, type SignInProblems, type SignInValues } from './validate-sign-in';

const OFFLINE_MESSAGE =
  'No connection to the Breakline server. Signing in needs the internet once; after that this device works offline.';

function serverMessage(error: unknown): string {
  if (isApiError(error, 'network_error')) return OFFLINE_MESSAGE;
  if (error instanceof Error) return error.message;
  return 'Signing in did not work. Try again.';
}

export interface SignInFormProps {
  onSignedIn: (answer: SessionAnswer) => void;
  /** Filled in for a member this device already knows. */
  email?: string;
  /** How the answer is kept, when not as the one person signed in (see useLogin). */
  keep?: (answer: SessionAnswer) => void | Promise<void>;
}

export function SignInForm({ onSignedIn, email = '', keep }: SignInFormProps) {
  const [values, setValues] = useState<SignInValues>({ email, password: '' });
  const [problems, setProblems] = useState<SignInProblems>({});
  const login = useLogin(keep);

  const change = (field: keyof SignInValues) => (event: { target: { value: string } }) => {
    setValues((v) => ({ ...v, [field]: event.target.value }));
    setProblems((p) => ({ ...p, [field]: undefined }));
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (login.isPending) return;
    const found = validateSignIn(values);
    setProblems(found);
    if (Object.keys(found).length > 0) return;
    login.mutate(
      { email: values.email.trim(), password: values.password },
      {
        onSuccess: onSignedIn,
        onError: (error) => {
          if (!isApiError(error)) return;
          setProblems({ email: error.fieldMessage('email'), password: error.fieldMessage('password') });
        },
      },
    );
  };

  const busy = login.isPending;
  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2.5} aria-busy={busy}>
      {login.isError && <Alert severity="error">{serverMessage(login.error)}</Alert>}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        value={values.email}
        onChange={change('email')}
        error={Boolean(problems.email)}
        helperText={problems.email}
        slotProps={{ htmlInput: { inputMode: 'email', autoCapitalize: 'none', spellCheck: false } }}
        fullWidth
      />
      <PasswordField
        label="Password"
        autoComplete="current-password"
        value={values.password}
        onChange={change('password')}
        error={Boolean(problems.password)}
        helperText={problems.password}
        fullWidth
      />
      <Button
        type="submit"
        variant="contained"
        size="large"
        disabled={busy}
        startIcon={busy ? <CircularProgress size={20} color="inherit" aria-hidden /> : undefined}
      >
        {busy ? 'Signing in…' : 'Sign in'}
      </Button>
    </Stack>
  );
}
