import { z } from 'zod';

/** Building blocks shared by the kinds. Messages are predicates: the field's name goes first. */
export const recordId = () => z.uuid({ error: 'must be a record id (a UUID)' });
export const memberId = () =>
  z.string({ error: 'must be a member id' }).min(1, { error: 'must be a member id' }).max(64);
export const utcTime = () =>
  z.iso.datetime({ error: 'must be a UTC date and time such as 2026-12-01T09:30:00Z' });
export const localDate = () => z.iso.date({ error: 'must be a date such as 2026-12-01' });
export const sha256 = () =>
  z.string().regex(/^[0-9a-f]{64}$/, {
    error: 'must be a photo reference (the SHA-256 of the photo, 64 lowercase hex characters)',
  });
/** Text that must say something; leading and trailing spaces are kept as typed. */
export const label = (max: number) =>
  z.string().max(max).regex(/\S/, { error: 'must not be blank' });
export const text = (max: number) => z.string().max(max);
export const atLeastZero = () => z.number().min(0);
export const positive = () => z.number().positive();

/** A dated, signed entry in a list of notes; lists of these merge by union. */
export const noteEntry = () =>
  z.strictObject({ at: utcTime(), by: memberId(), text: label(2000) });
export type NoteEntry = z.infer<ReturnType<typeof noteEntry>>;

/** Milliseconds of an ISO time, for ordering checks between fields of one record. */
export function ms(iso: string): number {
  return Date.parse(iso);
}
