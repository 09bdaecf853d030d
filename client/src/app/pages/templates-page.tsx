import { canUseReviewDesk } from '@/features/auth/roles';
import { TemplateList } from '@/features/checks/editor/template-list';
import { RoleGate } from './role-gate';

export function TemplatesPage() {
  return (
    <RoleGate allowed={canUseReviewDesk} who="supervisors and admins">
      <TemplateList />
    </RoleGate>
  );
}
