import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm'
import type { PartKind } from '../../shared/schemas/part-kinds'
import type { PartAttributes } from '../../shared/schemas/part-attributes'

@Entity('part')
export class PartEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Column({ type: 'text', unique: true })
  partNumber!: string

  /** The part number without case or punctuation, for lookups as typed at the counter. */
  @Index()
  @Column({ type: 'text' })
  partKey!: string

  @Index()
  @Column({ type: 'text' })
  kind!: PartKind

  @Column({ type: 'text' })
  name!: string

  @Index()
  @Column({ type: 'text', default: '' })
  family!: string

  @Column({ type: 'integer', nullable: true })
  yearFrom!: number | null

  @Column({ type: 'integer', nullable: true })
  yearTo!: number | null

  @Column({ type: 'text', default: '' })
  notes!: string

  @Column({ type: 'simple-json' })
  attributes!: PartAttributes

  /** The price to quote when no unit is on a shelf, in cents of the shop's currency; null when none is known. */
  @Column({ type: 'integer', nullable: true })
  listPriceCents!: number | null

  /** The import batch that wrote it last, if any. */
  @Index()
  @Column({ type: 'integer', nullable: true })
  batchId!: number | null

  @CreateDateColumn()
  createdAt!: Date

  @UpdateDateColumn()
  updatedAt!: Date
}
