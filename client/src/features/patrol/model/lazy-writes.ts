import type * as Writes from './writes';

/*
 * Today's taps (sign on, sign off, launch, retrieve) with their module loaded on first use. A
 * write checks the record against its kind's schema, and the schemas bring the validator, a
 * large share of Today's script; Today only reads until somebody taps. The service worker holds
 * the chunk, so the first tap works offline too. Buttons call `preloadWrites` on pointer down so
 * that the chunk is usually there by the click.
 */
export const preloadWrites = (): Promise<typeof Writes> => import('./writes');

export const signOn: typeof Writes.signOn = async (...args) => (await preloadWrites()).signOn(...args);
export const signOff: typeof Writes.signOff = async (...args) => (await preloadWrites()).signOff(...args);
export const launchTrip: typeof Writes.launchTrip = async (...args) => (await preloadWrites()).launchTrip(...args);
export const retrieveTrip: typeof Writes.retrieveTrip = async (...args) => (await preloadWrites()).retrieveTrip(...args);
