import { localToUtc, utcToLocal, type KindFields } from '@breakline/sync-protocol';
import type { DraftErrors } from './boat-draft';

type MotorFields = KindFields['motor'];

export interface MotorDraft {
  serial: string;
  model: string;
  powerHp: string;
  hourMeter: string;
  intervalHours: string;
  intervalMonths: string;
  /** The club's local date of the last service, YYYY-MM-DD. */
  lastServiceDate: string;
  lastServiceHours: string;
  fuelMode: MotorFields['fuelMode'];
  premixRatio: string;
  boatId: string;
  /** The stored instant, kept while the date is untouched. */
  storedService?: { date: string; at: string };
}

const num = (n: number | null) => (n === null ? '' : String(n));

export function newMotorDraft(boatId = ''): MotorDraft {
  return {
    serial: '', model: '', powerHp: '', hourMeter: '0', intervalHours: '', intervalMonths: '', lastServiceDate: '',
    lastServiceHours: '', fuelMode: 'premix', premixRatio: '', boatId,
  };
}

export function motorDraftOf(m: MotorFields, zone: string): MotorDraft {
  const date = m.lastServiceAt ? utcToLocal(m.lastServiceAt, zone).date : '';
  return {
    serial: m.serial, model: m.model, powerHp: num(m.powerHp), hourMeter: num(m.hourMeter), intervalHours: num(m.serviceIntervalHours),
    intervalMonths: num(m.serviceIntervalMonths), lastServiceDate: date, lastServiceHours: num(m.lastServiceHours), fuelMode: m.fuelMode,
    premixRatio: num(m.premixRatio), boatId: m.boatId ?? '', storedService: m.lastServiceAt ? { date, at: m.lastServiceAt } : undefined,
  };
}

/** A number box: blank is null; anything else must be a number (a decimal comma is fine). */
function parse(text: string, errors: DraftErrors, field: string, message: string, check: (n: number) => boolean): number | null {
  if (text.trim() === '') return null;
  const n = Number(text.trim().replace(',', '.'));
  if (!Number.isFinite(n) || !check(n)) errors[field] = message;
  return n;
}

// Noon local: a service date then reads as the same date in the club's zone, whatever the season.
function serviceInstant(d: MotorDraft, zone: string): string | null {
  if (!d.lastServiceDate) return null;
  if (d.storedService?.date === d.lastServiceDate) return d.storedService.at;
  const r = localToUtc(`${d.lastServiceDate}T12:00`, zone);
  return r.status === 'ok' ? r.instant : r.status === 'ambiguous' ? r.earlier : r.before;
}

export function buildMotor(d: MotorDraft, zone: string): { ok: true; fields: MotorFields } | { ok: false; errors: DraftErrors } {
  const e: DraftErrors = {};
  if (!d.serial.trim()) e.serial = 'Enter the serial number from the motor’s plate.';
  if (!d.model.trim()) e.model = 'Enter the make and model.';
  const powerHp = parse(d.powerHp, e, 'powerHp', 'Enter the power in hp, above 0 and up to 300.', (n) => n > 0 && n <= 300);
  if (powerHp === null) e.powerHp = 'Enter the power in hp.';
  const hourMeter = parse(d.hourMeter, e, 'hourMeter', 'Enter the hour meter reading, 0 or more.', (n) => n >= 0) ?? 0;
  const hours = parse(d.intervalHours, e, 'intervalHours', 'Enter the service interval in hours, above 0.', (n) => n > 0);
  const months = parse(d.intervalMonths, e, 'intervalMonths', 'Enter the interval as whole months, 1 to 120.', (n) => Number.isInteger(n) && n >= 1 && n <= 120);
  if (hours === null && months === null) e.intervalHours = 'Give a service interval in hours, in months, or both (see the manual).';
  const lastHours = parse(d.lastServiceHours, e, 'lastServiceHours', 'Enter the hour meter at the last service, 0 or more.', (n) => n >= 0);
  if ((lastHours === null) !== (d.lastServiceDate === '')) e.lastServiceHours = 'Give both the date and the hour meter of the last service, or neither.';
  if (lastHours !== null && lastHours > hourMeter) e.lastServiceHours = 'The hours at the last service must not be above the hour meter now.';
  const ratio = d.fuelMode === 'premix' ? parse(d.premixRatio, e, 'premixRatio', 'Enter the ratio as petrol to oil, 10 to 200, e.g. 50 for 50:1.', (n) => n >= 10 && n <= 200) : null;
  if (d.fuelMode === 'premix' && ratio === null) e.premixRatio = 'Enter the premix ratio from the motor’s manual.';
  if (Object.keys(e).length > 0) return { ok: false, errors: e };
  return {
    ok: true,
    fields: {
      serial: d.serial.trim(), model: d.model.trim(), powerHp: powerHp!, hourMeter, serviceIntervalHours: hours, serviceIntervalMonths: months,
      lastServiceAt: serviceInstant(d, zone), lastServiceHours: lastHours, fuelMode: d.fuelMode, premixRatio: ratio, boatId: d.boatId || null,
    },
  };
}
