import { Column, Entity, PrimaryColumn } from 'typeorm'

/** Failed sign-ins per address, and per address and e-mail, kept in the database so a restart forgets nothing. */
@Entity('sign_in_throttle')
export class SignInThrottleEntity {
  /** `address|<ip>` or `account|<ip>|<e-mail>`. */
  @PrimaryColumn({ type: 'varchar', length: 400 })
  key = ''

  @Column({ type: 'integer' })
  failures = 0

  /** Milliseconds since the epoch: the first failure of the current window. */
  @Column({ type: 'bigint' })
  windowStartedAt = 0
}
