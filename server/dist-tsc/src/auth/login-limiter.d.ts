import type { RequestHandler } from 'express';
/**
 * Counts failed sign-ins per address and e-mail; successful ones do not count, so a crew that
 * shares the clubhouse Wi-Fi is not locked out by one person's typos.
 */
export declare function loginLimiter(maxFailures: number, windowMinutes: number): RequestHandler;
