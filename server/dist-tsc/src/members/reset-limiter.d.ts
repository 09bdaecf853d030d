import type { RequestHandler } from 'express';
/** Every reset request counts, per address and e-mail, so nobody can flood an inbox from one place. */
export declare function resetLimiter(max: number, windowMinutes: number): RequestHandler;
