import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm'
import { FieldReportEntity } from './field-report.entity'

/** One photo of a report, stored re-encoded twice (display size and thumbnail) under storage keys. */
@Entity('field_report_photo')
export class FieldReportPhotoEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Index()
  @Column({ type: 'integer' })
  reportId!: number

  @ManyToOne(() => FieldReportEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'reportId' })
  report!: FieldReportEntity

  @Column({ type: 'integer' })
  position!: number

  @Column({ type: 'text' })
  displayKey!: string

  @Column({ type: 'text' })
  thumbKey!: string

  @Column({ type: 'integer' })
  width!: number

  @Column({ type: 'integer' })
  height!: number
}
