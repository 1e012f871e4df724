import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'

/** One security event (sign-in, failed sign-in, password, role, disable, import, revert): who, when, from where. */
@Entity('security_event')
export class SecurityEventEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Column({ type: 'varchar', length: 40 })
  kind!: string

  @Index()
  @Column({ type: Date })
  at!: Date

  @Column({ type: 'integer', nullable: true })
  actorId!: number | null

  @Column({ type: 'text', nullable: true })
  actorEmail!: string | null

  @Column({ type: 'varchar', length: 100, nullable: true })
  address!: string | null

  @Column({ type: 'text', nullable: true })
  detail!: string | null
}
