import bcrypt from 'bcryptjs'
import { In, type DataSource, type Repository } from 'typeorm'
import type { Role, User, UserUpdateInput } from '../../shared/schemas/auth'
import { UserEntity } from './user.entity'
import { AppError } from '../errors/app-error'
import { SessionRepository } from '../auth/session.repository'
import { databaseOf } from '../db/sqlite-connection'
import { SecurityEventService } from '../security/security-events.service'
import type { NewSecurityEvent } from '../security/security-event.repository'
import type { SqlValue } from '../db/database'
import { BCRYPT_ROUNDS, checkNewPassword, hashPassword, needsRehash } from '../auth/password-policy'

// Compared against when the e-mail is unknown, so both failures take the same time.
const NO_SUCH_USER_HASH = bcrypt.hashSync('no such user', BCRYPT_ROUNDS)
/** The seeded demo accounts' cost: their password is published anyway, and seeding stays quick. */
const DEMO_ROUNDS = 10
/** The hash of an invited user who has not chosen a password yet: nothing matches it. */
export const INVITE_PENDING = ''

/** What a user answer is made of: the entity, or a row read through the port. */
type UserRow = Pick<UserEntity, 'id' | 'email' | 'name' | 'role' | 'passwordHash' | 'homeSiteId'> & { disabledAt: unknown }

export function toUser(entity: UserRow): User {
  return {
    id: entity.id,
    email: entity.email,
    name: entity.name,
    role: entity.role,
    disabled: entity.disabledAt !== null,
    invitePending: entity.passwordHash === INVITE_PENDING,
    homeSiteId: entity.homeSiteId ?? null,
  }
}

/** A home site must be a site: a 400 on the field otherwise. */
function noSite(siteId: number): AppError {
  return AppError.badRequest(`No site ${siteId}.`, [{ path: 'homeSiteId', message: `No site ${siteId}; choose one of the sites.` }])
}

export class UserService {
  private readonly users: Repository<UserEntity>
  private readonly sessions: SessionRepository
  private readonly events: SecurityEventService

  constructor(private readonly dataSource: DataSource) {
    this.users = dataSource.getRepository(UserEntity)
    this.sessions = new SessionRepository(databaseOf(dataSource))
    this.events = new SecurityEventService(dataSource)
  }

  /** The user for a right e-mail and password; a disabled account is refused with its own message once the password is right. */
  async verifyCredentials(email: string, password: string): Promise<User | null> {
    const entity = await this.users.findOneBy({ email: email.trim().toLowerCase() })
    const pending = !entity || entity.passwordHash === INVITE_PENDING
    // An invited user without a password yet takes as long to refuse as anyone else.
    const matches = await bcrypt.compare(password, pending ? NO_SUCH_USER_HASH : entity.passwordHash)
    if (!entity || pending || !matches) return null
    if (entity.disabledAt) throw new AppError(403, 'account_disabled', 'This account is disabled. Ask an administrator to enable it.')
    // The password is at hand only now, so this is when an older, cheaper hash is made again at today's cost.
    if (needsRehash(entity.passwordHash)) await this.users.update({ id: entity.id }, { passwordHash: await hashPassword(password) })
    return toUser(entity)
  }

  /** The signed-in user behind a session; a disabled one no longer counts as signed in. */
  async findById(id: number): Promise<User | null> {
    // Every signed-in request asks this: one prepared statement through the port, not an entity load.
    const row = await databaseOf(this.dataSource).get<UserRow>(
      'SELECT "id", "email", "name", "role", "passwordHash", "disabledAt", "homeSiteId" FROM "user" WHERE "id" = ?',
      [id],
    )
    return row && row.disabledAt === null ? toUser(row) : null
  }

  async list(): Promise<User[]> {
    return (await this.users.find({ order: { email: 'ASC' } })).map(toUser)
  }

  /** Adds a user; the password must not be a common one. */
  async create(input: { email: string; name: string; role: Role; password: string }): Promise<User> {
    checkNewPassword(input.password)
    return this.insert(input, await hashPassword(input.password))
  }

  /** The demo accounts, on their published password: known on purpose, so the common-password check does not apply. */
  async createDemo(input: { email: string; name: string; role: Role; password: string }): Promise<User> {
    return this.insert(input, await hashPassword(input.password, DEMO_ROUNDS))
  }

  private async insert(input: { email: string; name: string; role: Role }, passwordHash: string): Promise<User> {
    if (await this.users.existsBy({ email: input.email.trim().toLowerCase() })) {
      throw AppError.conflict(`A user with e-mail ${input.email} exists already.`, [{ path: 'email', message: 'This e-mail is taken.' }])
    }
    const entity = this.users.create({
      email: input.email.trim().toLowerCase(),
      name: input.name,
      role: input.role,
      passwordHash,
    })
    return toUser(await this.users.save(entity))
  }

  /**
   * Changes name, role, password or whether the account is disabled; the last
   * enabled administrator cannot lose the role or be disabled. The hash is made
   * first: the check and the write then run as one synchronous transaction,
   * with no other request in between. A new password or a disabled account
   * ends the user's sessions (but the acting one, when it is their own).
   */
  async update(
    id: number,
    change: UserUpdateInput,
    acting: { userId: number; email?: string; sessionId?: string; address?: string },
  ): Promise<User> {
    if (change.password) checkNewPassword(change.password)
    const passwordHash = change.password ? await hashPassword(change.password) : null
    // Through the port: one transaction on either database, which waits its turn while an import writes.
    const before = await databaseOf(this.dataSource).transaction(async (tx) => {
      const current = await tx.get<{ role: Role; email: string; disabledAt: unknown }>(
        'SELECT "role", "email", "disabledAt" FROM "user" WHERE "id" = ?',
        [id],
      )
      if (!current) throw AppError.notFound(`No user with id ${id}.`)
      if (change.homeSiteId !== undefined && change.homeSiteId !== null) {
        if (!(await tx.get('SELECT 1 AS "found" FROM site WHERE "id" = ?', [change.homeSiteId]))) throw noSite(change.homeSiteId)
      }
      const losesAdmin = current.role === 'admin' && ((change.role && change.role !== 'admin') || change.disabled === true)
      if (losesAdmin) {
        const row = await tx.get<{ admins: number }>(
          'SELECT CAST(COUNT(*) AS INTEGER) AS "admins" FROM "user" WHERE "role" = \'admin\' AND "disabledAt" IS NULL',
        )
        if ((row?.admins ?? 0) <= 1) throw AppError.conflict('Fitwright needs at least one administrator; make another one first.')
      }
      if (id === acting.userId && change.disabled === true) throw AppError.conflict('You cannot disable your own account.')
      if (id === acting.userId && change.role && change.role !== 'admin' && current.role === 'admin') {
        throw AppError.conflict('You cannot take the administrator role from yourself.')
      }
      const sets: string[] = []
      const values: SqlValue[] = []
      const set = (column: string, value: SqlValue) => {
        sets.push(`"${column}" = ?`)
        values.push(value)
      }
      if (change.name !== undefined) set('name', change.name)
      if (change.role !== undefined) set('role', change.role)
      if (passwordHash) set('passwordHash', passwordHash)
      if (change.disabled !== undefined) set('disabledAt', change.disabled ? new Date() : null)
      if (change.homeSiteId !== undefined) set('homeSiteId', change.homeSiteId)
      if (sets.length) await tx.run(`UPDATE "user" SET ${sets.join(', ')} WHERE "id" = ?`, [...values, id])
      // A password set here makes any invitation or reset link still out for the user worthless.
      if (passwordHash) await tx.run('UPDATE account_token SET "usedAt" = ? WHERE "userId" = ? AND "usedAt" IS NULL', [new Date(), id])
      return current
    })
    if (passwordHash || change.disabled === true) {
      await this.sessions.removeForUser(id, id === acting.userId ? acting.sessionId : undefined)
    }
    const who = { actorId: acting.userId, actorEmail: acting.email ?? null, address: acting.address ?? null }
    const happened: NewSecurityEvent[] = []
    if (passwordHash) happened.push({ kind: 'password_change', detail: `password of ${before.email}` })
    if (change.role && change.role !== before.role)
      happened.push({ kind: 'role_change', detail: `${before.email}: ${before.role} to ${change.role}` })
    if (change.disabled === true && !before.disabledAt) happened.push({ kind: 'disable', detail: before.email })
    if (change.disabled === false && before.disabledAt) happened.push({ kind: 'enable', detail: before.email })
    for (const event of happened) await this.events.record({ ...event, ...who })
    return toUser(await this.users.findOneByOrFail({ id }))
  }

  /** The user's own site, or none; a site that does not exist is refused. */
  async setHomeSite(id: number, homeSiteId: number | null): Promise<User> {
    // Through the port, so it runs on either database: one's own home site is the everyday change.
    await databaseOf(this.dataSource).transaction(async (tx) => {
      if (homeSiteId !== null && !(await tx.get('SELECT 1 AS "found" FROM site WHERE "id" = ?', [homeSiteId]))) throw noSite(homeSiteId)
      await tx.run('UPDATE "user" SET "homeSiteId" = ? WHERE "id" = ?', [homeSiteId, id])
    })
    return toUser(await this.users.findOneByOrFail({ id }))
  }

  async count(): Promise<number> {
    return this.users.count()
  }

  /** Of the given accounts, those that still sign in with the given password (the published demo one). */
  async withPassword(emails: string[], password: string): Promise<User[]> {
    const all = await this.users.findBy({ email: In(emails) })
    const matches = await Promise.all(all.map((user) => bcrypt.compare(password, user.passwordHash)))
    return all.filter((_, index) => matches[index]).map(toUser)
  }
}
