import { useMemo } from 'react';
import { useSession } from '@/features/auth/use-auth';
import { clubPressureUnit } from '@/lib/pressure-entry';
import type { ReadinessContext } from '../readiness/adapt';
import { useNow } from './use-now';

export function useReadinessContext(): ReadinessContext {
  const { activeClub } = useSession();
  const now = useNow();
  return useMemo(
    () => ({ now, zone: activeClub.timeZone, unit: clubPressureUnit(activeClub.pressureUnit) }),
    [now, activeClub.timeZone, activeClub.pressureUnit],
  );
}
