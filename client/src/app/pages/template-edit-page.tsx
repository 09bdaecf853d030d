import { useParams } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { canUseReviewDesk } from '@/features/auth/roles';
import { TemplateEditor } from '@/features/checks/editor/template-editor';
import { RoleGate } from './role-gate';

/** An admin edits, a supervisor reads, the club's launch or stow check template. */
export function TemplateEditPage() {
  const { checkType } = useParams();
  if (checkType !== 'launch' && checkType !== 'stow') {
    return <EmptyState title="No such check">Check templates are the launch check and the stow check.</EmptyState>;
  }
  return (
    <RoleGate allowed={canUseReviewDesk} who="supervisors and admins">
      <TemplateEditor key={checkType} checkType={checkType} />
    </RoleGate>
  );
}
