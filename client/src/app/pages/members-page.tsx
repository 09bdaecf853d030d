import { useEffect, useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import PersonAddOutlined from '@mui/icons-material/PersonAddOutlined';
import { useQueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useNavigate, useSearchParams } from 'react-router-dom';
import { ChoosePin } from '@/features/auth/components/choose-pin';
import { MemberList } from '@/features/auth/components/member-list';
import { PinEntry } from '@/features/auth/components/pin-entry';
import { RemoveMemberDialog } from '@/features/auth/components/remove-member-dialog';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { setMemberPin, signInMember } from '@/features/auth/members/device';
import type { DeviceMember } from '@/features/auth/members/roster';
import { useDeviceMembers } from '@/features/auth/members/use-members';
import { useAuthState } from '@/features/auth/use-auth';
import { syncRunner } from '@/sync';
import { paths, safeNextPath } from '../paths';
import { DevicePageFrame } from './device-page-frame';

type Step =
  | { kind: 'list' }
  | { kind: 'pin'; member: DeviceMember }
  /** `newPin`: they forgot it (or have none here), so they choose one after the password. */
  | { kind: 'password'; member: DeviceMember; newPin: boolean }
  | { kind: 'choose'; userId: string; name: string };

/** Switch member: the members signed in on this shared device, each a tap and a PIN away. */
export function MembersPage() {
  const members = useDeviceMembers();
  const { notice: signedOut } = useAuthState();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  const [step, setStep] = useState<Step>({ kind: 'list' });
  const [removing, setRemoving] = useState<DeviceMember | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  // The shed tablet may rest on this screen: it keeps sending every member's changes, as the shell does.
  useEffect(() => syncRunner.start(), []);

  // Every cached answer was the previous member's; their changes go out with their own tokens.
  const switched = () => {
    queryClient.clear();
    void syncRunner.requestSync();
    navigate(next, { replace: true });
  };

  const pick = (member: DeviceMember) => {
    const view = members.find((v) => v.member.userId === member.userId);
    if (view?.active) return navigate(next, { replace: true });
    if (view?.byPin) return setStep({ kind: 'pin', member });
    setStep({ kind: 'password', member, newPin: member.pin === null });
  };

  if (step.kind === 'pin') {
    return (
      <DevicePageFrame title="Switch member">
        <PinEntry
          member={step.member}
          onSwitched={switched}
          onPassword={() => setStep({ kind: 'password', member: step.member, newPin: true })}
          onCancel={() => setStep({ kind: 'list' })}
        />
      </DevicePageFrame>
    );
  }
  if (step.kind === 'password') {
    return (
      <DevicePageFrame title="Switch member">
        <Typography variant="h5" component="h2" sx={{ fontWeight: 700 }}>
          {step.member.displayName}
        </Typography>
        <Typography color="text.secondary" sx={{ mb: 2 }}>
          Sign in with your password. This needs a connection once; changes waiting on this device for you are sent afterwards.
        </Typography>
        <SignInForm
          email={step.member.email}
          keep={(answer) => signInMember(answer)}
          onSignedIn={(answer) =>
            step.newPin ? setStep({ kind: 'choose', userId: answer.user.id, name: answer.user.displayName }) : switched()
          }
        />
        <Button fullWidth size="large" color="inherit" sx={{ mt: 2 }} onClick={() => setStep({ kind: 'list' })}>
          Back to the list
        </Button>
      </DevicePageFrame>
    );
  }
  if (step.kind === 'choose') {
    return (
      <DevicePageFrame title="Switch member">
        <ChoosePin
          title={`A new PIN for ${step.name}`}
          intro="With it you switch to yourself on this device, with or without a signal."
          onChosen={async (pin) => {
            await setMemberPin(step.userId, pin);
            switched();
          }}
        />
      </DevicePageFrame>
    );
  }
  return (
    <DevicePageFrame title="Switch member">
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        Members signed in on this device. Tap your name and enter your PIN; what you change is recorded and sent as you.
      </Typography>
      {signedOut && !notice && (
        <Alert severity="info" sx={{ mb: 2 }}>
          {signedOut}
        </Alert>
      )}
      {notice && (
        <Alert severity="info" sx={{ mb: 2 }} onClose={() => setNotice(null)}>
          {notice}
        </Alert>
      )}
      {members.length === 0 ? (
        <Alert severity="info" sx={{ mb: 2 }}>
          Nobody is signed in on this device yet.
        </Alert>
      ) : (
        <MemberList members={members} onPick={pick} onRemove={setRemoving} />
      )}
      <Box sx={{ display: 'grid', gap: 1, mt: 2 }}>
        <Button component={RouterLink} to={paths.memberAdd.href()} variant="outlined" size="large" startIcon={<PersonAddOutlined />}>
          Add a member to this device
        </Button>
      </Box>
      <RemoveMemberDialog
        member={removing}
        onClose={() => setRemoving(null)}
        onRemoved={(member, result) => {
          setRemoving(null);
          setNotice(
            result.kept > 0
              ? `${member.displayName} is off this device. ${result.kept === 1 ? 'One change waits' : `${result.kept} changes wait`} here until they sign in again.`
              : `${member.displayName} is off this device.`,
          );
        }}
      />
    </DevicePageFrame>
  );
}
