import type { RequestHandler } from 'express';
import { addressEmailLimiter } from '../common/address-email-limiter.js';

/**
 * Counts failed sign-ins per address and e-mail; successful ones do not count, so a crew that
 * shares the clubhouse Wi-Fi is not locked out by one person's typos.
 */
export function loginLimiter(maxFailures: number, windowMinutes: number): RequestHandler {
  return addressEmailLimiter({
    max: maxFailures,
    windowMinutes,
    failuresOnly: true,
    message: `Too many failed sign-ins. Wait ${windowMinutes} minutes and try again, or ask your club admin to reset your password.`,
  });
}
