import { useEffect, useState } from 'react';

/** The current instant, moved on every `everyMs`, so "today" turns over at the club's midnight. */
export function useNow(everyMs = 60_000): string {
  const [now, setNow] = useState(() => new Date().toISOString());
  useEffect(() => {
    const timer = setInterval(() => setNow(new Date().toISOString()), everyMs);
    return () => clearInterval(timer);
  }, [everyMs]);
  return now;
}
