import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm'
import { LinkEntity } from '../fitment/link.entity'
import { FieldReportEntity } from './field-report.entity'

/** An approved report's word on one link: it confirms it, or it found otherwise (the link is then flagged, not changed). */
@Entity('field_report_link')
@Index(['reportId', 'linkId'], { unique: true })
export class FieldReportLinkEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Column({ type: 'integer' })
  reportId!: number

  @ManyToOne(() => FieldReportEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'reportId' })
  report!: FieldReportEntity

  @Index()
  @Column({ type: 'integer' })
  linkId!: number

  @ManyToOne(() => LinkEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'linkId' })
  link!: LinkEntity

  /** The batch of the approval that wrote this row, so reverting it takes the row back too. */
  @Index()
  @Column({ type: 'integer' })
  batchId!: number

  /** 1 when the report found what the link says, 0 when it contradicts it. */
  @Column({ type: 'integer' })
  agrees!: number
}
