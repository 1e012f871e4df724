import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm'
import { ImportBatchEntity } from './import-batch.entity'

export type ImportRecordType = 'part' | 'link' | 'identity' | 'vehicle' | 'stock'

/**
 * The previous values of a record a batch updated or deleted, so a revert can
 * put them back. Records a batch created need no row here: they carry the
 * batch in their own batchId column, which keeps a large first import fast.
 */
@Entity('import_change')
export class ImportChangeEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Index()
  @Column({ type: 'integer' })
  batchId!: number

  @ManyToOne(() => ImportBatchEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'batchId' })
  batch!: ImportBatchEntity

  @Column({ type: 'text' })
  recordType!: ImportRecordType

  @Column({ type: 'integer' })
  recordId!: number

  @Column({ type: 'text' })
  action!: 'updated' | 'deleted'

  /** The batch that had written the record before (null: not an import); a later batch naming this one blocks its revert. */
  @Index()
  @Column({ type: 'integer', nullable: true })
  previousBatchId!: number | null

  /** JSON of the record's rows as they were (with marks or modification ids). */
  @Column({ type: 'text' })
  previousValues!: string
}
