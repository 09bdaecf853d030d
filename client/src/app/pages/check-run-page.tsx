import { useParams } from 'react-router-dom';
import { CheckRunner } from '@/features/checks/components/check-runner';
import { QuickDefect } from '@/features/defects/components/quick-defect';

/** The runner, with the defects feature's report button under each failed item. */
export function CheckRunPage() {
  const { checkId = '' } = useParams();
  return <CheckRunner checkId={checkId} reportDefect={(failed) => <QuickDefect {...failed} />} />;
}
