import { Column, Entity, Index, PrimaryColumn } from 'typeorm'

/**
 * express-session rows, kept by our own store (`session-store.ts`): the user
 * id is a column so every session of one user can be ended at once, and the
 * start time bounds a session however often it is renewed.
 */
@Entity('user_session')
export class SessionEntity {
  @PrimaryColumn({ type: 'varchar', length: 255 })
  id = ''

  @Index()
  @Column({ type: 'integer', nullable: true })
  userId: number | null = null

  @Column({ type: 'text' })
  data = ''

  /** Milliseconds since the epoch: idle end, pushed on with every request. */
  @Index()
  @Column({ type: 'bigint' })
  expiresAt = 0

  /** Milliseconds since the epoch: when the session was made (sign-in makes a new one). */
  @Column({ type: 'bigint' })
  startedAt = 0
}
