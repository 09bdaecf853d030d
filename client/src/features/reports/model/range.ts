const DATE = /^\d{4}-\d{2}-\d{2}$/;

/**
 * The season up to today: from the 1st of September before it. Surf patrol seasons in Australia
 * and New Zealand run through the southern summer (common practice, no source); any other dates
 * can be chosen on the page.
 */
export function seasonStart(today: string): string {
  const [y, m] = today.split('-').map(Number) as [number, number];
  return `${m >= 9 ? y : y - 1}-09-01`;
}

/** The dates asked for in the address, or this season up to today at the club. */
export function seasonRange(search: URLSearchParams, today: string): { from: string; to: string; problem: string | null } {
  const from = search.get('from');
  const to = search.get('to');
  const range = { from: from && DATE.test(from) ? from : seasonStart(today), to: to && DATE.test(to) ? to : today };
  return { ...range, problem: range.from > range.to ? 'The "from" date is after the "to" date: swap them.' : null };
}
