import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'

export type AccountTokenPurpose = 'invite' | 'reset'

/**
 * A one-time link to set a password (an invitation or a reset). Only the
 * token's SHA-256 is kept, so a copy of the database opens no account.
 */
@Entity('account_token')
export class AccountTokenEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Index()
  @Column({ type: 'integer' })
  userId!: number

  @Column({ type: 'varchar', length: 20 })
  purpose!: AccountTokenPurpose

  @Index({ unique: true })
  @Column({ type: 'varchar', length: 64 })
  tokenHash!: string

  @Column({ type: Date })
  expiresAt!: Date

  /** Set when the link was used, or when a newer link or a password change made it worthless. */
  @Column({ type: Date, nullable: true })
  usedAt!: Date | null

  @CreateDateColumn()
  createdAt!: Date
}
