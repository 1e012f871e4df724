import type { NextFunction, Request, Response } from 'express'
import { Router } from 'express'
import type passport from 'passport'
import { loginSchema, type User } from '../../shared/schemas/auth'
import { lockoutMessage, type SignInThrottle } from './sign-in-throttle'
import type { SecurityEventService } from '../security/security-events.service'
import { requireSignIn } from './require-role'
import { AppError } from '../errors/app-error'
import { parseBody } from '../middleware/validate'
import { csrfToken, CSRF_COOKIE } from './csrf'

function promisify(fn: (done: (error?: unknown) => void) => void): Promise<void> {
  return new Promise((resolve, reject) => fn((error) => (error ? reject(error) : resolve())))
}

export function authRoutes(auth: passport.PassportStatic, options: { throttle: SignInThrottle; events: SecurityEventService }): Router {
  const router = Router()
  const { throttle, events } = options

  router.post('/auth/login', async (req: Request, res: Response, next: NextFunction) => {
    const { email } = (req.body = parseBody(loginSchema, req))
    const ip = req.ip ?? ''
    const lockout = await throttle.lockout(ip, email)
    if (lockout) {
      res.setHeader('Retry-After', String(lockout.retryAfterSeconds))
      throw new AppError(429, 'too_many_attempts', lockoutMessage(lockout))
    }
    const user = await new Promise<User | false>((resolve, reject) => {
      auth.authenticate('local', (error: unknown, found: User | false) => (error ? reject(error) : resolve(found)))(req, res, next)
    })
    if (!user) {
      await throttle.recordFailure(ip, email)
      await events.record({ kind: 'sign_in_failed', actorEmail: email, address: ip })
      // One message for both halves, so a caller cannot probe which e-mails exist.
      throw new AppError(401, 'invalid_credentials', 'E-mail or password is not right.')
    }
    await throttle.recordSuccess(ip, email)
    await events.record({ kind: 'sign_in', actorId: user.id, actorEmail: user.email, address: ip })
    // A new session id on sign-in, so a session id planted before sign-in is worthless.
    await promisify((done) => req.session.regenerate(done))
    await promisify((done) => req.login(user, done))
    // The new session gets its own token; the cookie carries it to the page.
    csrfToken(req, res)
    res.json(user)
  })

  router.post('/auth/logout', requireSignIn, async (req: Request, res: Response) => {
    await promisify((done) => req.logout(done))
    await promisify((done) => req.session.destroy(done))
    res.clearCookie('fitwright.sid')
    res.clearCookie(CSRF_COOKIE)
    res.status(204).end()
  })

  router.get('/auth/me', requireSignIn, (req: Request, res: Response) => {
    csrfToken(req, res)
    res.json(req.user)
  })

  /** The token state-changing requests send back in x-csrf-token; also before sign-in (for the sign-in itself). */
  router.get('/auth/csrf', (req: Request, res: Response) => {
    res.set('Cache-Control', 'no-store').json({ token: csrfToken(req, res) })
  })

  return router
}
