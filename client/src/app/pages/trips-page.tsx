import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function TripsPage() {
  return (
    <>
      <PageHeader title="Trips" subtitle="Launch to retrieval" />
      <EmptyState title="No trips yet">
        Each trip shows here with its launch and retrieval times, purpose, conditions, engine hours and fuel, and
        any incident notes.
      </EmptyState>
    </>
  );
}
