import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function ChecksPage() {
  return (
    <>
      <PageHeader title="Checks" subtitle="Launch checks and stow checks" />
      <EmptyState title="No checks yet">
        Launch checks and stow checks run on this device show here. Each one is saved on the device as you go and
        sent to the club when there is a connection.
      </EmptyState>
    </>
  );
}
