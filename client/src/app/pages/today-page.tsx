import Typography from '@mui/material/Typography';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { useSession } from '@/features/auth/use-auth';

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
      <EmptyState title="No boats yet">
        When the club admin adds the club's boats, each one shows here with its state for the day, who is signed on
        and what needs doing next.
      </EmptyState>
      <Typography variant="body2" color="text.secondary" sx={{ mt: 3 }}>
        Breakline records and reminds; it does not decide. The club's procedures, the manufacturer's manual and the
        patrol captain's call come first.
      </Typography>
    </>
  );
}
