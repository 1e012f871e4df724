import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'

export type OutboxStatus = 'queued' | 'sent' | 'failed'

/** A message waiting to go, sent, or given up on after its retries: never lost, always visible to an admin. */
@Entity('mail_outbox')
@Index(['status', 'nextAttemptAt'])
export class MailOutboxEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  /** What the message is about (report-decided, reports-waiting...), for digests and the admin's list. */
  @Column({ type: 'text' })
  kind!: string

  @Column({ type: 'text' })
  recipient!: string

  @Column({ type: 'text' })
  subject!: string

  @Column({ type: 'text' })
  text!: string

  @Column({ type: 'text' })
  html!: string

  @Column({ type: 'text', default: 'queued' })
  status!: OutboxStatus

  @Column({ type: 'integer', default: 0 })
  attempts!: number

  @Column({ type: 'text', default: '' })
  lastError!: string

  @Column({ type: Date })
  nextAttemptAt!: Date

  @Column({ type: Date, nullable: true })
  sentAt!: Date | null

  @CreateDateColumn()
  createdAt!: Date
}
