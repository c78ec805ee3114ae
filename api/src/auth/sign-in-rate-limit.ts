import type { ApiError } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { negotiateLocale } from '../common/i18n/negotiate-locale.js';
import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { AppConfig } from '../config/app-config.js';

/**
 * Limits sign-in and sign-up attempts per client address (fixed window, in memory).
 * express-rate-limit rather than @nestjs/throttler: the latter is CommonJS-only and cannot load
 * the ESM-only Nest 12 packages under jest on Node 20.
 */
export function signInRateLimit(config: Pick<AppConfig, 'loginThrottle'>, multiplier = 1): RequestHandler {
  return rateLimit({
    windowMs: config.loginThrottle.ttlMs,
    limit: config.loginThrottle.limit * multiplier,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // A forwarding header from an untrusted client is expected and ignored (see TRUST_PROXY), not a mistake.
    validate: { xForwardedForHeader: false },
    // Said in the language the request asks for (Accept-Language), as every other sign-in answer.
    handler: (req, res) => {
      const body: ApiError = {
        statusCode: 429,
        error: 'Too Many Requests',
        message: apiWords(negotiateLocale(req.headers['accept-language']))('auth.tooManyAttempts'),
      };
      res.status(429).json(body);
    },
  });
}
