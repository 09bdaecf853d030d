import { PageHeader } from '@/components/page-header';
import { CheckList } from '@/features/checks/components/check-list';

export function ChecksPage() {
  return (
    <>
      <PageHeader title="Checks" subtitle="Launch checks and stow checks" />
      <CheckList />
    </>
  );
}
