import { createHash, randomBytes } from 'node:crypto'
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
import type { AccountTokenPurpose } from './account-token.entity'
import type { MessageContent } from '../mail/templates'
import type { SecurityEventKind } from '../../shared/schemas/security-events'
import type { ResetThrottle } from './reset-throttle'

const INVITE_HOURS = 7 * 24
const RESET_HOURS = 1

/** Who asked, for the security events. */
export type Acting = { userId?: number; email?: string; sessionId?: string; address?: string }

export const LINK_UNUSABLE = 'This link has expired or was used already. Ask for a new one.'

function sha256(token: string): string {
  return createHash('sha256').update(token).digest('hex')
}

/**
 * Passwords set through mailed links (invitations and resets). A link's token
 * is random, kept only as its hash, works once and for a limited time, and a
 * newer link or any password change retires it.
 */
export class AccountService {
  private readonly resetsInFlight = new Set<Promise<void>>()

  constructor(
    private readonly db: Database,
    private readonly tokens: AccountTokenRepository,
    private readonly deps: {
      users: UserService
      outbox: OutboxService
      sessions: SessionRepository
      events: SecurityEventService
      resetThrottle: ResetThrottle
      publicUrl: string
      clock?: () => Date
    },
  ) {}

  private now(): Date {
    return this.deps.clock?.() ?? new Date()
  }

  /**
   * Issues a link and queues its mail inside the caller's transaction: a fresh
   * token whose hash goes in the table and the token itself only in the mail.
   */
  private async mailLink(
    tx: Database,
    to: { userId: number; email: string },
    purpose: AccountTokenPurpose,
    message: (url: string, validHours: number) => MessageContent,
  ) {
    const hours = purpose === 'invite' ? INVITE_HOURS : RESET_HOURS
    const token = randomBytes(32).toString('base64url')
    const now = this.now()
    const expiresAt = new Date(now.getTime() + hours * 3_600_000)
    await this.tokens.issue(tx, { userId: to.userId, purpose, tokenHash: sha256(token), expiresAt }, now)
    const url = passwordLinkUrl(this.deps.publicUrl, token)
    await this.deps.outbox.enqueue({
      kind: purpose === 'invite' ? 'invite' : 'password-reset',
      recipient: to.email,
      ...message(url, hours),
    })
  }

  private record(kind: SecurityEventKind, acting: Acting, detail: string | null = null) {
    return this.deps.events.record({ kind, actorId: acting.userId, actorEmail: acting.email, address: acting.address, detail })
  }

  /** Makes the user with no password and queues the invitation, all or nothing. */
  async invite(input: UserInviteInput, acting: Acting & { name: string }): Promise<User> {
    const email = input.email.trim().toLowerCase()
    const userId = await this.db.transaction(async (tx) => {
      if (await this.tokens.emailTaken(tx, email)) {
        throw AppError.conflict(`A user with e-mail ${email} exists already.`, [{ path: 'email', message: 'This e-mail is taken.' }])
      }
      const id = await this.tokens.insertInvitedUser(tx, { ...input, email }, this.now())
      await this.mailLink(tx, { userId: id, email }, 'invite', (url, validHours) =>
        inviteMessage({ ...input, invitedBy: acting.name, url, validHours }),
      )
      return id
    })
    await this.record('invite', acting, email)
    const user = await this.deps.users.findById(userId)
    if (!user) throw new Error(`The invited user ${userId} is gone.`)
    return user
  }

  /** A new invitation for someone who has not set a password yet; the earlier link stops working. */
  async reinvite(userId: number, acting: Acting & { name: string }): Promise<User> {
    const stored = await this.tokens.userById(userId)
    const user = await this.deps.users.findById(userId)
    if (!stored) throw AppError.notFound(`No user with id ${userId}.`)
    if (stored.passwordHash !== INVITE_PENDING) {
      throw AppError.conflict(`${stored.name} has set a password already; they can use "Forgot password".`)
    }
    if (!user) throw AppError.conflict(`${stored.name} is disabled; enable the account first.`)
    await this.db.transaction((tx) =>
      this.mailLink(tx, { userId, email: user.email }, 'invite', (url, validHours) =>
        inviteMessage({ ...user, invitedBy: acting.name, url, validHours }),
      ),
    )
    await this.record('invite', acting, `${user.email} again`)
    return user
  }

  /**
   * Answers at once, the same for every address; whether the e-mail has an
   * enabled account is looked up after the answer, so neither the answer nor
   * its timing tells. Only an address asking too often is told to wait.
   */
  async forgotPassword(email: string, address: string): Promise<{ waitSeconds: number | null }> {
    const { retryAfterSeconds, mayMail } = await this.deps.resetThrottle.record(address, email)
    if (retryAfterSeconds !== null) return { waitSeconds: retryAfterSeconds }
    await this.record('password_reset_request', { email, address })
    if (mayMail) {
      const work = this.mailReset(email).catch((error: unknown) => console.error('Reset mail not queued:', error))
      this.resetsInFlight.add(work)
      void work.finally(() => this.resetsInFlight.delete(work))
    }
    return { waitSeconds: null }
  }

  /** Resolves once the reset mails asked for so far are queued (or given up on). */
  async resetsQueued(): Promise<void> {
    await Promise.all([...this.resetsInFlight])
  }

  private async mailReset(email: string) {
    const user = await this.tokens.findUser(email)
    if (!user || user.disabledAt) return
    await this.db.transaction((tx) =>
      this.mailLink(tx, { userId: user.id, email: user.email }, 'reset', (url, validHours) =>
        resetMessage({ name: user.name, url, validHours }),
      ),
    )
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
    await this.record(
      'password_reset',
      { userId: holder.userId, email: holder.email, address },
      holder.purpose === 'invite' ? 'invitation accepted' : 'reset link used',
    )
    return { email: holder.email }
  }
}
