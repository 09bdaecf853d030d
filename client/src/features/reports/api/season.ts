import { useMutation, useQuery } from '@tanstack/react-query';
import { TRIP_PURPOSES, type TripPurpose } from '@breakline/sync-protocol';
import { useSession } from '@/features/auth/use-auth';
import { apiFile, apiRequest } from '@/lib/api-client';
import { ApiError } from '@/lib/api-error';
import { saveFile } from '@/lib/save-file';

/** One boat's hours on the water: in the range, and in each week of `weeks` (same order). */
export interface BoatHours {
  boatId: string;
  boatName: string | null;
  fleetNumber: string | null;
  totalHours: number;
  weekly: number[];
}

/** Defects reported in the week, and defects returned to service (verified) in the week, whenever raised. */
export interface DefectWeek {
  week: string;
  raised: number;
  returnedToService: number;
}

/** GET /api/reports/season: the same figures the committee's PDF prints. */
export interface SeasonReportView {
  from: string;
  to: string;
  generatedAt: string;
  /** The Monday (local date) of each week in the range, oldest first. */
  weeks: string[];
  hoursOnWater: { total: number; byBoat: BoatHours[] };
  trips: { total: number; open: number; byPurpose: Record<TripPurpose, number> };
  defects: { raised: number; closed: number; medianHoursToRepair: number | null; repairedCount: number; weekly: DefectWeek[] };
  rescues: { incidents: number; persons: number };
  assists: { incidents: number; persons: number };
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const isNum = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);
const broken = () => new ApiError(200, 'bad_response', 'The server sent season figures Breakline cannot read. Reload the page; if it keeps happening, tell your club admin.');
const str = (v: unknown) => (typeof v === 'string' ? v : null);

function pair(v: unknown) {
  if (!isObject(v) || !isNum(v.incidents) || !isNum(v.persons)) throw broken();
  return { incidents: v.incidents, persons: v.persons };
}

/** Checks the answer has the shape agreed; a wrong shape is an error, never a chart of zeros. */
export function parseSeason(body: unknown): SeasonReportView {
  if (!isObject(body) || !Array.isArray(body.weeks) || !isObject(body.hoursOnWater) || !isObject(body.trips) || !isObject(body.defects)) throw broken();
  const weeks = body.weeks.map((w) => { if (typeof w !== 'string') throw broken(); return w; });
  const h = body.hoursOnWater;
  if (!isNum(h.total) || !Array.isArray(h.byBoat)) throw broken();
  const byBoat = h.byBoat.map((b): BoatHours => {
    if (!isObject(b) || typeof b.boatId !== 'string' || !isNum(b.totalHours) || !Array.isArray(b.weekly) || b.weekly.length !== weeks.length || !b.weekly.every(isNum)) throw broken();
    return { boatId: b.boatId, boatName: str(b.boatName), fleetNumber: str(b.fleetNumber), totalHours: b.totalHours, weekly: b.weekly };
  });
  const t = body.trips;
  if (!isNum(t.total) || !isNum(t.open) || !isObject(t.byPurpose)) throw broken();
  const byPurpose = Object.fromEntries(TRIP_PURPOSES.map((p) => {
    const n = (t.byPurpose as Record<string, unknown>)[p];
    if (!isNum(n)) throw broken();
    return [p, n];
  })) as Record<TripPurpose, number>;
  const d = body.defects;
  if (!isNum(d.raised) || !isNum(d.closed) || !isNum(d.repairedCount) || !Array.isArray(d.weekly) || !(d.medianHoursToRepair === null || isNum(d.medianHoursToRepair))) throw broken();
  const weekly = d.weekly.map((w): DefectWeek => {
    if (!isObject(w) || typeof w.week !== 'string' || !isNum(w.raised) || !isNum(w.returnedToService)) throw broken();
    return { week: w.week, raised: w.raised, returnedToService: w.returnedToService };
  });
  return {
    from: String(body.from ?? ''), to: String(body.to ?? ''), generatedAt: String(body.generatedAt ?? ''), weeks,
    hoursOnWater: { total: h.total, byBoat },
    trips: { total: t.total, open: t.open, byPurpose },
    defects: { raised: d.raised, closed: d.closed, medianHoursToRepair: d.medianHoursToRepair as number | null, repairedCount: d.repairedCount, weekly },
    rescues: pair(body.rescues), assists: pair(body.assists),
  };
}

const query = (from: string, to: string) => new URLSearchParams({ from, to }).toString();

export function useSeasonFigures(from: string, to: string, enabled: boolean) {
  const { activeClub } = useSession();
  return useQuery({
    queryKey: ['season', activeClub.id, from, to],
    queryFn: async ({ signal }) => parseSeason(await apiRequest<unknown>(`/api/reports/season?${query(from, to)}`, { signal })),
    enabled,
  });
}

export type JobState = 'queued' | 'working' | 'done' | 'failed';

const JOB_STATES: readonly string[] = ['queued', 'working', 'done', 'failed'];

export interface PdfProgress {
  onState?: (state: JobState) => void;
  /** Milliseconds between asks; tests shorten it. */
  every?: number;
  /** Give up after this many asks (two minutes at the default pace). */
  maxPolls?: number;
  signal?: AbortSignal;
}

const wait = (ms: number, signal?: AbortSignal) => new Promise<void>((resolve, reject) => {
  const t = setTimeout(resolve, ms);
  signal?.addEventListener('abort', () => { clearTimeout(t); reject(new DOMException('Aborted', 'AbortError')); }, { once: true });
});

/** Asks for the committee's PDF, waits for the job, and downloads it. */
export async function makeSeasonPdf(from: string, to: string, progress: PdfProgress = {}): Promise<void> {
  const every = progress.every ?? 1500;
  const maxPolls = progress.maxPolls ?? 80;
  const started = await apiRequest<{ jobId?: unknown }>('/api/reports/season/pdf', { method: 'POST', body: { from, to } });
  if (typeof started?.jobId !== 'string') throw broken();
  const id = encodeURIComponent(started.jobId);
  progress.onState?.('queued');
  for (let i = 0; i < maxPolls; i++) {
    const job = await apiRequest<{ state?: unknown; error?: unknown }>(`/api/reports/jobs/${id}`, { signal: progress.signal });
    if (!JOB_STATES.includes(String(job?.state))) throw broken();
    const state = job.state as JobState;
    progress.onState?.(state);
    if (state === 'done') {
      const { blob, fileName } = await apiFile(`/api/reports/jobs/${id}/file`, { signal: progress.signal });
      saveFile(blob, fileName ?? `breakline-season-report-${from}-to-${to}.pdf`);
      return;
    }
    if (state === 'failed') {
      const why = typeof job.error === 'string' ? job.error.replace(/\.$/, '') : null;
      throw new ApiError(200, 'job_failed', `The PDF could not be made${why ? `: ${why}` : ''}. Try again; if it fails again, tell your club admin.`);
    }
    await wait(every, progress.signal);
  }
  throw new ApiError(0, 'job_slow', 'The PDF is taking longer than usual. Try again in a few minutes; the figures on this page are already up to date.');
}

export function useSeasonPdf(onState: (s: JobState) => void) {
  return useMutation({ mutationFn: ({ from, to }: { from: string; to: string }) => makeSeasonPdf(from, to, { onState }) });
}
