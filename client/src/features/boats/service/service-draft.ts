import { localToUtc, type KindFields } from '@breakline/sync-protocol';

export interface ServiceDraft {
  /** The club's local date, YYYY-MM-DD. */
  date: string;
  engineHours: string;
  work: string;
  parts: string;
  performedBy: string;
}

export type ServiceDraftErrors = Partial<Record<keyof ServiceDraft, string>>;

export const newServiceDraft = (today: string, hourMeter: number): ServiceDraft => ({
  date: today, engineHours: String(hourMeter), work: '', parts: '', performedBy: '',
});

/**
 * A service record from what was typed, or a message for each box to fix. The date may not be
 * after today; the hours may not be below the last service's
 * unless the service is an older one entered late (a meter only goes up).
 */
export function buildService(
  d: ServiceDraft, motorId: string, ctx: { today: string; zone: string; last: { date: string; hours: number } | null },
): { ok: true; fields: KindFields['serviceRecord'] } | { ok: false; errors: ServiceDraftErrors } {
  const e: ServiceDraftErrors = {};
  if (!/^\d{4}-\d{2}-\d{2}$/.test(d.date)) e.date = 'Enter the date of the service.';
  else if (d.date > ctx.today) e.date = 'The service date cannot be after today.';
  const text = d.engineHours.trim().replace(',', '.');
  const hours = Number(text);
  if (text === '') e.engineHours = 'Enter the hour meter reading at the service.';
  else if (!Number.isFinite(hours) || hours < 0) e.engineHours = 'Enter the hour meter as a number, 0 or more, e.g. 212.5.';
  else if (ctx.last !== null && d.date >= ctx.last.date && hours < ctx.last.hours) {
    e.engineHours = `The hour meter cannot be below the ${ctx.last.hours.toFixed(1)} h of the last service: check the reading.`;
  }
  if (!d.work.trim()) e.work = 'Say what was done, e.g. gearbox oil changed, plugs replaced.';
  else if (d.work.length > 4000) e.work = 'Keep the work done to 4000 characters.';
  if (d.parts.length > 2000) e.parts = 'Keep the parts to 2000 characters.';
  if (!d.performedBy.trim()) e.performedBy = 'Enter who did the service (a member or an outside mechanic).';
  else if (d.performedBy.length > 120) e.performedBy = 'Keep the name to 120 characters.';
  let servicedAt = '';
  if (!e.date) {
    // Noon local: the date then reads the same in the club's zone whatever the season.
    try {
      const r = localToUtc(`${d.date}T12:00`, ctx.zone);
      servicedAt = r.status === 'ok' ? r.instant : r.status === 'ambiguous' ? r.earlier : r.before;
    } catch {
      e.date = 'Enter a real date, e.g. 2026-11-20.';
    }
  }
  if (Object.keys(e).length > 0) return { ok: false, errors: e };
  return {
    ok: true,
    fields: { motorId, servicedAt, engineHours: hours, work: d.work.trim(), parts: d.parts.trim(), performedBy: d.performedBy.trim() },
  };
}
