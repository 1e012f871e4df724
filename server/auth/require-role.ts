import type { NextFunction, Request, Response } from 'express'
import type { Role } from '../../shared/schemas/auth'
import { AppError } from '../errors/app-error'

/** 401 without a session; 403 when the signed-in role is not among those allowed. */
export function requireRole(...allowed: Role[]) {
  return (req: Request, _res: Response, next: NextFunction) => {
    if (!req.user) return next(new AppError(401, 'unauthenticated', 'Sign in to continue.'))
    if (allowed.length > 0 && !allowed.includes(req.user.role)) {
      return next(new AppError(403, 'forbidden', 'Your role may not do this.'))
    }
    next()
  }
}

export const requireSignIn = requireRole()
