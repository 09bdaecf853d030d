import { addDays, localToUtc } from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
/**
 * The instant a local calendar day starts at the club. Where midnight happens twice the day starts
 * at the first; where the clocks skip it, at the moment they jump.
 */
export function dayStartUtc(date, zone) {
    let r;
    try {
        r = localToUtc(`${date}T00:00`, zone);
    }
    catch {
        throw new AppError(400, 'validation_failed', `${date} is not a real date; give one such as 2026-11-01.`);
    }
    const at = r.status === 'ok' ? r.instant : r.status === 'ambiguous' ? r.earlier : r.before;
    // Millisecond form: compared as text with stored times, "…00Z" then sorts at or after "…00.000Z", as it should.
    return new Date(at).toISOString();
}
/** [start of `from`, start of the day after `to`) at the club, as UTC instants; either end may be open. */
export function clubDayRange(from, to, zone) {
    if (from && to && from > to)
        throw new AppError(400, 'validation_failed', `The range starts (${from}) after it ends (${to}); swap the dates.`);
    return {
        ...(from ? { fromUtc: dayStartUtc(from, zone) } : {}),
        ...(to ? { toUtc: dayStartUtc(nextDay(to), zone) } : {}),
    };
}
function nextDay(date) {
    try {
        return addDays(date, 1);
    }
    catch {
        throw new AppError(400, 'validation_failed', `${date} is not a real date; give one such as 2026-11-30.`);
    }
}
//# sourceMappingURL=club-days.js.map