import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function DefectsPage() {
  return (
    <>
      <PageHeader title="Defects" subtitle="Reported faults and what was done about them" />
      <EmptyState title="No defects reported">
        Defects reported on any of the club's boats show here with their severity, photos and where they are on the
        way from open to verified. A stood-down boat is not launched until a competent person returns it to service.
      </EmptyState>
    </>
  );
}
