import { canAdminister } from '@/features/auth/roles';
import { CaughtMailScreen } from '@/features/admin/components/caught-mail';
import { PageHeader } from '@/components/page-header';
import { DeskGate } from './desk-gate';

export function CaughtMailPage() {
  return (
    <DeskGate title="Caught mail" allowed={canAdminister} who="admins">
      <PageHeader title="Caught mail" subtitle="E-mails sent to this club's people while the local mail catcher runs" />
      <CaughtMailScreen />
    </DeskGate>
  );
}
