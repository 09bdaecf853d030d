import { useEffect, useState } from 'react';

/** The current instant, moved on every `everyMs`: a second for a running timer, a minute otherwise. */
export function useClock(everyMs = 1000): string {
  const [now, setNow] = useState(() => new Date().toISOString());
  useEffect(() => {
    const timer = setInterval(() => setNow(new Date().toISOString()), everyMs);
    return () => clearInterval(timer);
  }, [everyMs]);
  return now;
}
