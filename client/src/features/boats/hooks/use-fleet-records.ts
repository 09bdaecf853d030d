import { useMemo } from 'react';
import { useRecords } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import type { FleetRecords } from '../readiness/adapt';

export interface Fleet extends FleetRecords {
  boats: readonly LocalRecord<'boat'>[];
}

/** The club's boats and what their state depends on, as on this phone; undefined while loading. */
export function useFleetRecords(): Fleet | undefined {
  const boats = useRecords('boat');
  const checks = useRecords('check');
  const templates = useRecords('checkTemplate');
  const defects = useRecords('defect');
  const motors = useRecords('motor');
  const trips = useRecords('trip');
  const serviceRecords = useRecords('serviceRecord');
  return useMemo(
    () =>
      boats && checks && templates && defects && motors && trips && serviceRecords
        ? { boats, checks, templates, defects, motors, trips, serviceRecords }
        : undefined,
    [boats, checks, templates, defects, motors, trips, serviceRecords],
  );
}
