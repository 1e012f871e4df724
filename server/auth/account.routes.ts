import { Router, type Request, type Response } from 'express'
import { z } from 'zod'
import { rolesFor } from '../../shared/permissions'
import {
  changePasswordSchema,
  forgotPasswordSchema,
  passwordLinkSchema,
  setPasswordSchema,
  userInviteSchema,
} from '../../shared/schemas/accounts'
import { AppError } from '../errors/app-error'
import { parseBody, parseParams } from '../middleware/validate'
import { requireRole, requireSignIn } from './require-role'
import type { AccountService } from './account.service'
import type { OwnPasswordService } from './own-password.service'

const idParamsSchema = z.object({ id: z.coerce.number().int().positive('Give a user id.') })

/** The same answer whether or not the address has an account, so nobody learns which do. */
export const FORGOT_ANSWER = 'If that e-mail belongs to an account, a link to set a new password is on its way. It works for an hour.'

function acting(req: Request) {
  return { userId: req.user!.id, email: req.user!.email, name: req.user!.name, sessionId: req.sessionID, address: req.ip }
}

/** Invitations, "forgot password", mailed links, and changing one's own password. */
export function accountRoutes(accounts: AccountService, ownPassword: OwnPasswordService): Router {
  const router = Router()
  const adminOnly = requireRole(...rolesFor('users.manage'))

  router.post('/users/invite', adminOnly, async (req: Request, res: Response) => {
    res.status(201).json(await accounts.invite(parseBody(userInviteSchema, req), acting(req)))
  })

  router.post('/users/:id/invite', adminOnly, async (req: Request, res: Response) => {
    const { id } = parseParams(idParamsSchema, req)
    res.json(await accounts.reinvite(id, acting(req)))
  })

  router.post('/auth/forgot-password', async (req: Request, res: Response) => {
    const { email } = parseBody(forgotPasswordSchema, req)
    const { waitSeconds } = await accounts.forgotPassword(email, req.ip ?? '')
    if (waitSeconds !== null) {
      res.setHeader('Retry-After', String(waitSeconds))
      const minutes = Math.max(1, Math.ceil(waitSeconds / 60))
      throw new AppError(429, 'too_many_requests', `Too many reset requests from this address. Try again in ${minutes} minutes.`)
    }
    res.status(202).json({ message: FORGOT_ANSWER })
  })

  router.post('/auth/password-link', async (req: Request, res: Response) => {
    const { token } = parseBody(passwordLinkSchema, req)
    res.set('Cache-Control', 'no-store').json(await accounts.linkInfo(token))
  })

  router.post('/auth/set-password', async (req: Request, res: Response) => {
    const { token, password } = parseBody(setPasswordSchema, req)
    res.json(await accounts.setPasswordFromLink(token, password, req.ip ?? ''))
  })

  router.post('/auth/change-password', requireSignIn, async (req: Request, res: Response) => {
    await ownPassword.change(req.user!.id, parseBody(changePasswordSchema, req), acting(req))
    res.status(204).end()
  })

  return router
}
