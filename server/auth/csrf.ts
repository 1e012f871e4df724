import { randomBytes, timingSafeEqual } from 'node:crypto'
import type { NextFunction, Request, RequestHandler, Response } from 'express'
import { AppError } from '../errors/app-error'

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string
  }
}

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS'])
/** Readable by the page's own script (never by another site's), so the client can send it back as a header. */
export const CSRF_COOKIE = 'fitwright-csrf'
export const CSRF_HEADER = 'x-csrf-token'

/** The session's token, made on first use; a new session (after sign-in) gets a new one. */
export function csrfToken(req: Request, res: Response): string {
  const token = (req.session.csrfToken ??= randomBytes(32).toString('base64url'))
  res.cookie(CSRF_COOKIE, token, { sameSite: 'strict', secure: req.secure, httpOnly: false, path: '/' })
  return token
}

function sameHost(address: string | undefined, host: string | undefined): boolean | null {
  if (!address) return null
  try {
    return new URL(address).host === host
  } catch {
    return false
  }
}

/**
 * Every state-changing request must come from our own pages: its Origin (or,
 * without one, its Referer) names this host, and it carries the session's
 * token in the x-csrf-token header. A form post or a fetch from another site
 * has neither, so it gets 403 before anything runs.
 */
export function csrfProtection(): RequestHandler {
  return (req: Request, res: Response, next: NextFunction) => {
    if (SAFE.has(req.method)) return next()
    const host = req.get('host')
    const fromOrigin = sameHost(req.get('origin'), host)
    const fromPage = fromOrigin ?? sameHost(req.get('referer'), host)
    if (fromPage === false) return next(new AppError(403, 'cross_origin', 'This request came from another site and was refused.'))
    const sent = req.get(CSRF_HEADER) ?? ''
    const expected = req.session?.csrfToken ?? ''
    const matches = sent.length > 0 && sent.length === expected.length && timingSafeEqual(Buffer.from(sent), Buffer.from(expected))
    if (!matches) {
      return next(
        new AppError(403, 'csrf', `Missing or stale CSRF token: get one from GET /api/auth/csrf and send it in the ${CSRF_HEADER} header.`),
      )
    }
    next()
  }
}
