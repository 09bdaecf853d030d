import { FleetList } from '@/features/boats/editor/fleet-list';

export function FleetPage() {
  return <FleetList />;
}
