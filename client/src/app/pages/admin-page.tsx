import { canAdminister } from '@/features/auth/roles';
import { useCaughtMailOn } from '@/features/admin/api/caught-mail';
import { MembersScreen } from '@/features/admin/components/members-screen';
import { ClubSettingsForm } from '@/features/admin/components/club-settings-form';
import { PageHeader } from '@/components/page-header';
import { DeskGate } from './desk-gate';

export function AdminPage() {
  return (
    <DeskGate title="Admin" allowed={canAdminister} who="admins">
      <Members />
    </DeskGate>
  );
}

function Members() {
  const caught = useCaughtMailOn();
  return (
    <>
      <PageHeader title="Admin" subtitle="Invite people by e-mail, choose each member's role, and set the club's time zone, beach and units" />
      <MembersScreen showCaughtMail={caught} />
      <ClubSettingsForm />
    </>
  );
}
