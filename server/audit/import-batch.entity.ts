import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'
import type { ImportBatchStatus, ImportType } from '../../shared/schemas/imports'

/** One committed CSV import: who, when, which file, what it did. */
@Entity('import_batch')
export class ImportBatchEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Column({ type: 'text' })
  type!: ImportType

  @Column({ type: 'text' })
  fileName!: string

  /** SHA-256 of the uploaded bytes, so two batches of the same file can be told apart from two edits. */
  @Column({ type: 'text' })
  fileHash!: string

  @Column({ type: 'integer', nullable: true })
  userId!: number | null

  /** Kept as text so the history still reads right if the account changes. */
  @Column({ type: 'text' })
  userName!: string

  @Column({ type: 'integer', default: 0 })
  created!: number

  @Column({ type: 'integer', default: 0 })
  updated!: number

  @Column({ type: 'integer', default: 0 })
  unchanged!: number

  @Column({ type: 'integer', default: 0 })
  rejected!: number

  /** The editor chose to commit the valid rows of a file that had rejected rows. */
  @Column({ type: 'boolean', default: false })
  validRowsOnly!: boolean

  @Index()
  @Column({ type: 'text', default: 'committed' })
  status!: ImportBatchStatus

  @Column({ type: Date, nullable: true })
  revertedAt!: Date | null

  @Column({ type: 'text', nullable: true })
  revertedByName!: string | null

  @CreateDateColumn()
  createdAt!: Date
}
