import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
/** Every reset request counts, per address and e-mail, so nobody can flood an inbox from one place. */
export function resetLimiter(max, windowMinutes) {
    return rateLimit({
        windowMs: windowMinutes * 60_000,
        limit: max,
        standardHeaders: 'draft-8',
        legacyHeaders: false,
        keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '').trim().toLowerCase()}`,
        handler: (_req, res) => {
            const body = {
                statusCode: 429,
                code: 'too_many_attempts',
                message: `Too many password link requests. Wait ${windowMinutes} minutes, and check your spam folder for the links already sent.`,
            };
            res.status(429).json(body);
        },
    });
}
//# sourceMappingURL=reset-limiter.js.map