// ISO 8601-1:2019 durations in the designator form PnYnMnWnDTnHnMnS. Years, months, weeks and days
// are nominal (a day can be 23 or 25 hours across a daylight-saving change), so only a duration of
// hours, minutes and seconds has an exact length in seconds.

export interface IsoDuration {
  years: number; months: number; weeks: number; days: number;
  hours: number; minutes: number; seconds: number;
  /** Exact length in seconds, or null when a nominal part (Y, M, W or D) is present. */
  totalSeconds: number | null;
}

const RE = /^P(?:(\d+(?:[.,]\d+)?)Y)?(?:(\d+(?:[.,]\d+)?)M)?(?:(\d+(?:[.,]\d+)?)W)?(?:(\d+(?:[.,]\d+)?)D)?(?:T(?:(\d+(?:[.,]\d+)?)H)?(?:(\d+(?:[.,]\d+)?)M)?(?:(\d+(?:[.,]\d+)?)S)?)?$/;

export function parseIsoDuration(text: string): IsoDuration {
  const m = typeof text === 'string' ? RE.exec(text) : null;
  const parts = m ? m.slice(1, 8) : [];
  const present = parts.map((p, i) => (p === undefined ? -1 : i)).filter((i) => i >= 0);
  const timeDesignatorEmpty = m !== null && text.includes('T') && parts.slice(4).every((p) => p === undefined);
  if (!m || present.length === 0 || timeDesignatorEmpty) {
    throw new RangeError(`Not an ISO 8601 duration: "${String(text)}"; expected e.g. PT1H30M or P3Y6M4DT12H30M5S`);
  }
  // Only the smallest part given may carry a decimal fraction.
  const fractional = present.filter((i) => /[.,]/.test(parts[i]!));
  if (fractional.length > 1 || (fractional.length === 1 && fractional[0] !== present[present.length - 1])) {
    throw new RangeError(`In "${text}" only the last part of a duration may have a fraction`);
  }
  const [years, months, weeks, days, hours, minutes, seconds] = parts.map((p) => (p === undefined ? 0 : Number(p.replace(',', '.')))) as
    [number, number, number, number, number, number, number];
  const nominal = present.some((i) => i < 4);
  return {
    years, months, weeks, days, hours, minutes, seconds,
    totalSeconds: nominal ? null : hours * 3600 + minutes * 60 + seconds,
  };
}
