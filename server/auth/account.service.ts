import { createHash, randomBytes } from 'node:crypto'
import bcrypt from 'bcryptjs'
import type { Database } from '../db/database'
import { AppError } from '../errors/app-error'
import type { OutboxService } from '../mail/outbox.service'
import type { SecurityEventService } from '../security/security-events.service'
import type { SessionRepository } from './session.repository'
import type { User } from '../../shared/schemas/auth'
import type { PasswordLinkInfo, UserInviteInput } from '../../shared/schemas/accounts'
import { INVITE_PENDING, type UserService } from '../users/user.service'
import { checkNewPassword, hashPassword } from './password-policy'
import { inviteMessage, passwordLinkUrl, resetMessage } from './account-mail'
import type { AccountTokenRepository, TokenHolder } from './account-token.repository'
import type { ResetThrottle } from './reset-throttle'
import { lockoutMessage, type SignInThrottle } from './sign-in-throttle'

const INVITE_HOURS = 7 * 24
const RESET_HOURS = 1

/** Who asked, for the security events. */
export type Acting = { userId?: number; email?: string; sessionId?: string; address?: string }

export const LINK_UNUSABLE = 'This link has expired or was used already. Ask for a new one.'

function sha256(token: string): string {
  return createHash('sha256').update(token).digest('hex')
}

/**
 * Passwords set through mailed links (invitations and resets) and a signed-in
 * user's own change. A link's token is random, kept only as its hash, works
 * once and for a limited time, and a newer link or any password change retires it.
 */
export class AccountService {
  constructor(
    private readonly db: Database,
    private readonly tokens: AccountTokenRepository,
    private readonly deps: {
      users: UserService
      outbox: OutboxService
      sessions: SessionRepository
      events: SecurityEventService
      resetThrottle: ResetThrottle
      signInThrottle: SignInThrottle
      publicUrl: string
      clock?: () => Date
    },
  ) {}

  private now(): Date {
    return this.deps.clock?.() ?? new Date()
  }

  /** A fresh token; its hash goes in the table and the token itself only in the mail. */
  private newToken(hours: number) {
    const token = randomBytes(32).toString('base64url')
    return { token, tokenHash: sha256(token), expiresAt: new Date(this.now().getTime() + hours * 3_600_000) }
  }

  /** Makes the user with no password and queues the invitation, all or nothing. */
  async invite(input: UserInviteInput, acting: Acting & { name: string }): Promise<User> {
    const email = input.email.trim().toLowerCase()
    const { token, tokenHash, expiresAt } = this.newToken(INVITE_HOURS)
    const now = this.now()
    const userId = await this.db.transaction(async (tx) => {
      if (await this.tokens.emailTaken(tx, email)) {
        throw AppError.conflict(`A user with e-mail ${email} exists already.`, [{ path: 'email', message: 'This e-mail is taken.' }])
      }
      const id = await this.tokens.insertInvitedUser(tx, { ...input, email }, now)
      await this.tokens.issue(tx, { userId: id, purpose: 'invite', tokenHash, expiresAt }, now)
      await this.deps.outbox.enqueue({
        kind: 'invite',
        recipient: email,
        ...inviteMessage({ ...input, invitedBy: acting.name, url: passwordLinkUrl(this.deps.publicUrl, token), validHours: INVITE_HOURS }),
      })
      return id
    })
    await this.deps.events.record({
      kind: 'invite',
      actorId: acting.userId,
      actorEmail: acting.email,
      address: acting.address,
      detail: email,
    })
    const user = await this.deps.users.findById(userId)
    if (!user) throw new Error(`The invited user ${userId} is gone.`)
    return user
  }

  /** A new invitation for someone who has not set a password yet; the earlier link stops working. */
  async reinvite(userId: number, acting: Acting & { name: string }): Promise<User> {
    const user = await this.tokens.userById(userId)
    if (!user) throw AppError.notFound(`No user with id ${userId}.`)
    if (user.passwordHash !== INVITE_PENDING)
      throw AppError.conflict(`${user.name} has set a password already; they can use "Forgot password".`)
    if (user.disabledAt) throw AppError.conflict(`${user.name} is disabled; enable the account first.`)
    const found = (await this.deps.users.findById(userId))!
    const { token, tokenHash, expiresAt } = this.newToken(INVITE_HOURS)
    const now = this.now()
    await this.db.transaction(async (tx) => {
      await this.tokens.issue(tx, { userId, purpose: 'invite', tokenHash, expiresAt }, now)
      await this.deps.outbox.enqueue({
        kind: 'invite',
        recipient: user.email,
        ...inviteMessage({ ...found, invitedBy: acting.name, url: passwordLinkUrl(this.deps.publicUrl, token), validHours: INVITE_HOURS }),
      })
    })
    await this.deps.events.record({
      kind: 'invite',
      actorId: acting.userId,
      actorEmail: acting.email,
      address: acting.address,
      detail: `${user.email} again`,
    })
    return found
  }

  /**
   * Queues a reset link when the e-mail belongs to an enabled account. The
   * caller hears the same either way; only an address asking too often is told to wait.
   */
  async forgotPassword(email: string, address: string): Promise<{ waitSeconds: number | null }> {
    const { retryAfterSeconds, mayMail } = await this.deps.resetThrottle.record(address, email)
    if (retryAfterSeconds !== null) return { waitSeconds: retryAfterSeconds }
    await this.deps.events.record({ kind: 'password_reset_request', actorEmail: email, address })
    const user = await this.tokens.findUser(email)
    if (!user || user.disabledAt || !mayMail) return { waitSeconds: null }
    const { token, tokenHash, expiresAt } = this.newToken(RESET_HOURS)
    const now = this.now()
    await this.db.transaction(async (tx) => {
      await this.tokens.issue(tx, { userId: user.id, purpose: 'reset', tokenHash, expiresAt }, now)
      await this.deps.outbox.enqueue({
        kind: 'password-reset',
        recipient: user.email,
        ...resetMessage({ name: user.name, url: passwordLinkUrl(this.deps.publicUrl, token), validHours: RESET_HOURS }),
      })
    })
    return { waitSeconds: null }
  }

  private async holder(token: string): Promise<TokenHolder> {
    const holder = await this.tokens.findUsable(sha256(token), this.now())
    if (!holder || holder.disabledAt) throw new AppError(400, 'link_unusable', LINK_UNUSABLE)
    return holder
  }

  /** What a link is for and whose account it opens, before the person chooses a password. */
  async linkInfo(token: string): Promise<PasswordLinkInfo> {
    const { purpose, email, name } = await this.holder(token)
    return { purpose, email, name }
  }

  /** Sets the password from a link, once; every session of the account ends. */
  async setPasswordFromLink(token: string, password: string, address: string): Promise<{ email: string }> {
    const holder = await this.holder(token)
    checkNewPassword(password)
    // The slow hash first, outside the transaction.
    const passwordHash = await hashPassword(password)
    if (!(await this.tokens.usePassword(holder.tokenId, holder.userId, passwordHash, this.now()))) {
      throw new AppError(400, 'link_unusable', LINK_UNUSABLE)
    }
    await this.deps.sessions.removeForUser(holder.userId)
    await this.deps.events.record({
      kind: 'password_reset',
      actorId: holder.userId,
      actorEmail: holder.email,
      address,
      detail: holder.purpose === 'invite' ? 'invitation accepted' : 'reset link used',
    })
    return { email: holder.email }
  }

  /**
   * A signed-in user's own change, proving the current password first (wrong
   * guesses count as failed sign-ins); the user's other sessions end.
   */
  async changeOwnPassword(userId: number, input: { currentPassword: string; password: string }, acting: Acting): Promise<void> {
    const user = await this.tokens.userById(userId)
    if (!user) throw AppError.notFound(`No user with id ${userId}.`)
    const address = acting.address ?? ''
    const lockout = await this.deps.signInThrottle.lockout(address, user.email)
    if (lockout) throw new AppError(429, 'too_many_attempts', lockoutMessage(lockout))
    if (!(await bcrypt.compare(input.currentPassword, user.passwordHash || '-'))) {
      await this.deps.signInThrottle.recordFailure(address, user.email)
      throw AppError.badRequest('Your current password is not right.', [
        { path: 'currentPassword', message: 'This is not your current password.' },
      ])
    }
    if (input.currentPassword === input.password) {
      throw AppError.badRequest('Choose a password other than the current one.', [
        { path: 'password', message: 'This is your current password; choose a new one.' },
      ])
    }
    checkNewPassword(input.password)
    await this.tokens.setPassword(userId, await hashPassword(input.password), this.now())
    await this.deps.sessions.removeForUser(userId, acting.sessionId)
    await this.deps.events.record({
      kind: 'password_change',
      actorId: userId,
      actorEmail: user.email,
      address: acting.address,
      detail: `own password of ${user.email}`,
    })
  }
}
