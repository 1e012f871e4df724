import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'

export type SharedLinkKind = 'sheet' | 'quote'

/**
 * A read-only link to a build sheet or a quote, mailed to a colleague or a
 * customer. Only the token's SHA-256 is kept, so a copy of the database opens
 * nothing; the link stops working at its expiry.
 */
@Entity('shared_link')
@Index(['kind', 'targetId'])
export class SharedLinkEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Column({ type: 'varchar', length: 10 })
  kind!: SharedLinkKind

  /** The build sheet's or the quote's id. */
  @Column({ type: 'integer' })
  targetId!: number

  @Index({ unique: true })
  @Column({ type: 'varchar', length: 64 })
  tokenHash!: string

  @Column({ type: Date })
  expiresAt!: Date

  @Index()
  @Column({ type: 'integer' })
  sharedById!: number

  @Column({ type: 'text' })
  recipient!: string

  @CreateDateColumn()
  createdAt!: Date
}
