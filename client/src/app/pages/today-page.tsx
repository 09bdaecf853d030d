import Typography from '@mui/material/Typography';
import { PageHeader } from '@/components/page-header';
import { TodayBoard } from '@/features/boats/components/today-board';
import { BoatPatrol } from '@/features/patrol/components/boat-patrol';
import { useSession } from '@/features/auth/use-auth';
import { FirstSyncGate } from '../first-sync-gate';

function clubDate(timeZone: string): string {
  try {
    return new Intl.DateTimeFormat(undefined, { weekday: 'long', day: 'numeric', month: 'long', timeZone }).format(new Date());
  } catch {
    // An unknown zone name from the server: show the device's date rather than nothing.
    return new Intl.DateTimeFormat(undefined, { weekday: 'long', day: 'numeric', month: 'long' }).format(new Date());
  }
}

export function TodayPage() {
  const { activeClub } = useSession();
  return (
    <>
      <PageHeader title="Today" subtitle={`${activeClub.name} · ${clubDate(activeClub.timeZone)}`} />
      <FirstSyncGate>
        <TodayBoard boatExtra={(boat, result, boats) => <BoatPatrol boat={boat} boats={boats} state={result.ok ? result.readiness.state : null} />} />
      </FirstSyncGate>
      <Typography variant="body2" sx={{ color: 'text.secondary', mt: 3 }}>
        Breakline records and reminds; it does not decide. The club's procedures, the manufacturer's manual and the
        patrol captain's call come first. A stood-down boat is not launched until a competent person returns it to service.
      </Typography>
    </>
  );
}
