import type { RequestHandler } from 'express';
import { addressEmailLimiter } from '../common/address-email-limiter.js';

/** Every reset request counts, per address and e-mail, so nobody can flood an inbox from one place. */
export function resetLimiter(max: number, windowMinutes: number): RequestHandler {
  return addressEmailLimiter({
    max,
    windowMinutes,
    message: `Too many password link requests. Wait ${windowMinutes} minutes, and check your spam folder for the links already sent.`,
  });
}
