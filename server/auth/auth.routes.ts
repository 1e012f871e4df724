import type { NextFunction, Request, Response } from 'express'
import { Router } from 'express'
import type passport from 'passport'
import { loginSchema, type User } from '../../shared/schemas/auth'
import { loginThrottle } from './login-throttle'
import { requireSignIn } from './require-role'
import { AppError } from '../errors/app-error'
import { parseBody } from '../middleware/validate'

function promisify(fn: (done: (error?: unknown) => void) => void): Promise<void> {
  return new Promise((resolve, reject) => fn((error) => (error ? reject(error) : resolve())))
}

export function authRoutes(auth: passport.PassportStatic, options: { loginAttempts: number }): Router {
  const router = Router()

  router.post('/auth/login', loginThrottle(options.loginAttempts), async (req: Request, res: Response, next: NextFunction) => {
    req.body = parseBody(loginSchema, req)
    const user = await new Promise<User | false>((resolve, reject) => {
      auth.authenticate('local', (error: unknown, found: User | false) => (error ? reject(error) : resolve(found)))(req, res, next)
    })
    // One message for both halves, so a caller cannot probe which e-mails exist.
    if (!user) throw new AppError(401, 'invalid_credentials', 'E-mail or password is not right.')
    // A new session id on sign-in, so a session id planted before sign-in is worthless.
    await promisify((done) => req.session.regenerate(done))
    await promisify((done) => req.login(user, done))
    res.json(user)
  })

  router.post('/auth/logout', requireSignIn, async (req: Request, res: Response) => {
    await promisify((done) => req.logout(done))
    await promisify((done) => req.session.destroy(done))
    res.clearCookie('fitwright.sid')
    res.status(204).end()
  })

  router.get('/auth/me', requireSignIn, (req: Request, res: Response) => {
    res.json(req.user)
  })

  return router
}
