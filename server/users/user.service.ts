import bcrypt from 'bcryptjs'
import { In, type DataSource, type Repository } from 'typeorm'
import { inTransaction } from '../db/sqlite-connection'
import type { Role, User, UserUpdateInput } from '../../shared/schemas/auth'
import { UserEntity } from './user.entity'
import { AppError } from '../errors/app-error'

const BCRYPT_ROUNDS = 10
// Compared against when the e-mail is unknown, so both failures take the same time.
const NO_SUCH_USER_HASH = bcrypt.hashSync('no such user', BCRYPT_ROUNDS)

export function toUser(entity: UserEntity): User {
  return { id: entity.id, email: entity.email, name: entity.name, role: entity.role }
}

export class UserService {
  private readonly users: Repository<UserEntity>

  constructor(private readonly dataSource: DataSource) {
    this.users = dataSource.getRepository(UserEntity)
  }

  async verifyCredentials(email: string, password: string): Promise<User | null> {
    const entity = await this.users.findOneBy({ email: email.trim().toLowerCase() })
    const matches = await bcrypt.compare(password, entity?.passwordHash ?? NO_SUCH_USER_HASH)
    return entity && matches ? toUser(entity) : null
  }

  async findById(id: number): Promise<User | null> {
    const entity = await this.users.findOneBy({ id })
    return entity ? toUser(entity) : null
  }

  async list(): Promise<User[]> {
    return (await this.users.find({ order: { email: 'ASC' } })).map(toUser)
  }

  async create(input: { email: string; name: string; role: Role; password: string }): Promise<User> {
    if (await this.users.existsBy({ email: input.email.trim().toLowerCase() })) {
      throw AppError.conflict(`A user with e-mail ${input.email} exists already.`, [{ path: 'email', message: 'This e-mail is taken.' }])
    }
    const entity = this.users.create({
      email: input.email.trim().toLowerCase(),
      name: input.name,
      role: input.role,
      passwordHash: await bcrypt.hash(input.password, BCRYPT_ROUNDS),
    })
    return toUser(await this.users.save(entity))
  }

  /**
   * Changes name, role or password; the last administrator cannot lose the
   * role. The hash is made first: the check and the write then run as one
   * synchronous transaction, with no other request in between.
   */
  async update(id: number, change: UserUpdateInput, actingUserId: number): Promise<User> {
    const passwordHash = change.password ? await bcrypt.hash(change.password, BCRYPT_ROUNDS) : null
    await inTransaction(this.dataSource, (db) => {
      const current = db.prepare('SELECT role FROM user WHERE id = ?').get(id) as { role: Role } | undefined
      if (!current) throw AppError.notFound(`No user with id ${id}.`)
      if (change.role && change.role !== 'admin' && current.role === 'admin') {
        const { admins } = db.prepare("SELECT COUNT(*) AS admins FROM user WHERE role = 'admin'").get() as { admins: number }
        if (admins <= 1) throw AppError.conflict('Fitwright needs at least one administrator; make another one first.')
        if (id === actingUserId) throw AppError.conflict('You cannot take the administrator role from yourself.')
      }
      db.prepare(
        'UPDATE user SET name = COALESCE(?, name), role = COALESCE(?, role), passwordHash = COALESCE(?, passwordHash) WHERE id = ?',
      ).run(change.name ?? null, change.role ?? null, passwordHash, id)
    })
    return (await this.findById(id))!
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
