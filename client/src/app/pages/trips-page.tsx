import { PageHeader } from '@/components/page-header';
import { TripList } from '@/features/patrol/components/trip-list';

export function TripsPage() {
  return (
    <>
      <PageHeader title="Trips" subtitle="Launch to retrieval" />
      <TripList />
    </>
  );
}
