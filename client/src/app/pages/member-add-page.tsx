import { useState } from 'react';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { ChoosePin } from '@/features/auth/components/choose-pin';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { setMemberPin, signInMember } from '@/features/auth/members/device';
import { roster } from '@/features/auth/members/roster';
import { useAuthState } from '@/features/auth/use-auth';
import { syncRunner } from '@/sync';
import { paths } from '../paths';
import { DevicePageFrame } from './device-page-frame';

type Step = { kind: 'own-pin' } | { kind: 'sign-in' } | { kind: 'pin'; userId: string; name: string };

/**
 * Add a member to this device: the one using it now gets a PIN first (so they can switch back),
 * then the new member signs in once with their password and chooses theirs.
 */
export function MemberAddPage() {
  const { session } = useAuthState();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const [step, setStep] = useState<Step>(() =>
    session && !roster.find(session.user.id)?.pin ? { kind: 'own-pin' } : { kind: 'sign-in' },
  );
  const done = () => {
    queryClient.clear();
    void syncRunner.requestSync();
    navigate(paths.today.href(), { replace: true });
  };

  if (step.kind === 'own-pin' && session) {
    const name = session.user.displayName;
    return (
      <DevicePageFrame title="Add a member">
        <ChoosePin
          title={`First, a PIN for ${name}`}
          intro={`So ${name} can switch back to themself on this device once someone else is using it.`}
          onChosen={async (pin) => {
            await setMemberPin(session.user.id, pin);
            setStep({ kind: 'sign-in' });
          }}
        />
        <Button fullWidth size="large" color="inherit" sx={{ mt: 2 }} onClick={() => setStep({ kind: 'sign-in' })}>
          Skip: {name} signs in with the password next time
        </Button>
      </DevicePageFrame>
    );
  }
  if (step.kind === 'pin') {
    return (
      <DevicePageFrame title="Add a member">
        <ChoosePin
          title={`Your PIN, ${step.name}`}
          intro="With it you switch to yourself on this device, with or without a signal. Forgotten, it means signing in with the password again."
          onChosen={async (pin) => {
            await setMemberPin(step.userId, pin);
            done();
          }}
        />
      </DevicePageFrame>
    );
  }
  return (
    <DevicePageFrame title="Add a member">
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        The new member signs in once with their own e-mail and password (this needs a connection). Everyone already on this
        device stays signed in, and their changes are still sent as them.
      </Typography>
      <SignInForm
        keep={(answer) => signInMember(answer)}
        onSignedIn={(answer) =>
          roster.find(answer.user.id)?.pin ? done() : setStep({ kind: 'pin', userId: answer.user.id, name: answer.user.displayName })
        }
      />
      <Button fullWidth size="large" color="inherit" sx={{ mt: 2 }} onClick={() => navigate(-1)}>
        Cancel
      </Button>
    </DevicePageFrame>
  );
}
