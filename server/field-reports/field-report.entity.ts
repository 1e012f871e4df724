import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm'
import type { FieldReportStatus } from '../../shared/schemas/field-reports'
import { UserEntity } from '../users/user.entity'

/** What a tech found on the shop floor: the pairs, the vehicle, measurements and notes, waiting for an editor. */
@Entity('field_report')
@Index(['status', 'id'])
export class FieldReportEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Index()
  @Column({ type: 'integer', nullable: true })
  reporterId!: number | null

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'reporterId' })
  reporter!: UserEntity | null

  /** Kept as written, so the report still says who filed it when the account is gone. */
  @Column({ type: 'text' })
  reporterName!: string

  @Column({ type: 'text', default: 'submitted' })
  status!: FieldReportStatus

  /** The pairs, vehicle, measurements and notes as JSON (the shared schema's shape). */
  @Column({ type: 'text' })
  body!: string

  /** Warnings found when it was filed, as a JSON list. */
  @Column({ type: 'text', default: '[]' })
  warnings!: string

  @Column({ type: 'text', nullable: true })
  decidedByName!: string | null

  @Column({ type: Date, nullable: true })
  decidedAt!: Date | null

  /** The reason for a rejection, the question sent back, or the editor's note on approval. */
  @Column({ type: 'text', default: '' })
  decisionNote!: string

  /** The batch the approval wrote; reverting it sends the report back to the queue. */
  @Column({ type: 'integer', nullable: true })
  batchId!: number | null

  @CreateDateColumn()
  createdAt!: Date
}
