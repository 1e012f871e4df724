import bcrypt from 'bcryptjs'
import { AppError } from '../errors/app-error'
import type { SecurityEventService } from '../security/security-events.service'
import type { AccountTokenRepository } from './account-token.repository'
import type { Acting } from './account.service'
import { checkNewPassword, hashPassword } from './password-policy'
import type { SessionRepository } from './session.repository'
import { lockoutMessage, type SignInThrottle } from './sign-in-throttle'

/**
 * A signed-in user changes their own password, proving the current one first.
 * Wrong guesses count as failed sign-ins, so a borrowed session cannot be used
 * to guess the password; the user's other sessions end.
 */
export class OwnPasswordService {
  constructor(
    private readonly accounts: AccountTokenRepository,
    private readonly deps: { sessions: SessionRepository; events: SecurityEventService; signInThrottle: SignInThrottle },
  ) {}

  async change(userId: number, input: { currentPassword: string; password: string }, acting: Acting): Promise<void> {
    const user = await this.accounts.userById(userId)
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
    await this.accounts.setPassword(userId, await hashPassword(input.password), new Date())
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
