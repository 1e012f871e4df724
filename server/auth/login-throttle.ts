import type { Request, Response } from 'express'
import { ipKeyGenerator, rateLimit } from 'express-rate-limit'

const WINDOW_MS = 15 * 60 * 1000

/**
 * Failed sign-ins per address and e-mail in a quarter of an hour; successful
 * ones do not count. Slows password guessing, which matters while the demo
 * accounts with their published password are still around.
 */
export function loginThrottle(maxFailures: number) {
  return rateLimit({
    windowMs: WINDOW_MS,
    limit: maxFailures,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req: Request) => {
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : ''
      return `${ipKeyGenerator(req.ip ?? '')}|${email}`
    },
    handler: (_req: Request, res: Response) => {
      res.status(429).json({
        error: {
          code: 'too_many_attempts',
          message: 'Too many failed sign-ins. Wait a quarter of an hour, or ask an administrator to reset the password.',
        },
      })
    },
  })
}
