import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
/**
 * Counts failed sign-ins per address and e-mail; successful ones do not count, so a crew that
 * shares the clubhouse Wi-Fi is not locked out by one person's typos.
 */
export function loginLimiter(maxFailures, windowMinutes) {
    return rateLimit({
        windowMs: windowMinutes * 60_000,
        limit: maxFailures,
        skipSuccessfulRequests: true,
        standardHeaders: 'draft-8',
        legacyHeaders: false,
        keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '').trim().toLowerCase()}`,
        handler: (_req, res) => {
            const body = {
                statusCode: 429,
                code: 'too_many_attempts',
                message: `Too many failed sign-ins. Wait ${windowMinutes} minutes and try again, or ask your club admin to reset your password.`,
            };
            res.status(429).json(body);
        },
    });
}
//# sourceMappingURL=login-limiter.js.map