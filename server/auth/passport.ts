import passport from 'passport'
import { Strategy as LocalStrategy } from 'passport-local'
import type { Role, User } from '../../shared/schemas/auth'
import type { UserService } from '../users/user.service'

declare global {
  namespace Express {
    /** The signed-in user as the API shows it, never the password hash. */
    interface User {
      id: number
      email: string
      name: string
      role: Role
      disabled: boolean
      invitePending: boolean
      homeSiteId: number | null
    }
  }
}

/** A passport instance of our own, so tests can build several apps in one process. */
export function createPassport(users: UserService): passport.PassportStatic {
  const instance = new passport.Passport() as unknown as passport.PassportStatic
  instance.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      users
        .verifyCredentials(email, password)
        .then((user) => done(null, user ?? false))
        .catch(done)
    }),
  )
  instance.serializeUser((user, done) => done(null, (user as User).id))
  instance.deserializeUser((id: number, done) => {
    users
      .findById(id)
      .then((user) => done(null, user ?? false))
      .catch(done)
  })
  return instance
}
