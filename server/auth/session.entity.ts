import type { ISession } from 'connect-typeorm'
import { Column, DeleteDateColumn, Entity, Index, PrimaryColumn } from 'typeorm'

/** express-session rows, kept by connect-typeorm. */
@Entity('session')
export class SessionEntity implements ISession {
  @Index()
  @Column({ type: 'bigint' })
  expiredAt = Date.now()

  @PrimaryColumn({ type: 'varchar', length: 255 })
  id = ''

  @Column({ type: 'text' })
  json = ''

  @DeleteDateColumn({ nullable: true })
  destroyedAt?: Date
}
