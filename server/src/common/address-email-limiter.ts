import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { ErrorBody } from './app-error.js';

export interface AddressEmailLimit {
  max: number;
  windowMinutes: number;
  /** What the person is told on a 429, with what to do. */
  message: string;
  /** Count only requests that failed (sign-in), not every request (password links). */
  failuresOnly?: boolean;
}

/** Limits requests per client address and the e-mail in the body, answering 429 in the usual error shape. */
export function addressEmailLimiter({ max, windowMinutes, message, failuresOnly = false }: AddressEmailLimit): RequestHandler {
  return rateLimit({
    windowMs: windowMinutes * 60_000,
    limit: max,
    skipSuccessfulRequests: failuresOnly,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '').trim().toLowerCase()}`,
    handler: (_req, res) => {
      const body: ErrorBody = { statusCode: 429, code: 'too_many_attempts', message };
      res.status(429).json(body);
    },
  });
}
