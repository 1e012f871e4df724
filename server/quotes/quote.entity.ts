import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm'

/** A priced job: the lines and totals as quoted (kept as JSON, so a later price change never alters it). */
@Entity('quote')
export class QuoteEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Column({ type: 'text', default: 'draft' })
  status!: 'draft' | 'accepted'

  @Column({ type: 'text', default: '' })
  customer!: string

  @Column({ type: 'integer', nullable: true })
  buildSheetId!: number | null

  @Column({ type: 'text' })
  body!: string

  @Column({ type: 'text' })
  createdByName!: string

  /** Customer, VIN, make, model and engine family in lower case, for the list's search. */
  @Column({ type: 'text', default: '' })
  searchText!: string

  @Column({ type: Date, nullable: true })
  reservedUntil!: Date | null

  @CreateDateColumn()
  createdAt!: Date
}
