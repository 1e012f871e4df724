import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm'
import type { StockCondition, StockStatus } from '../../shared/schemas/stock'
import { PartEntity } from '../catalogue/part.entity'
import { SiteEntity } from './site.entity'

/** One physical unit on a shelf: its condition, where it is, what it costs, whether it is still there. */
@Entity('stock_item')
@Index(['partId', 'status'])
export class StockItemEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Column({ type: 'integer' })
  partId!: number

  @ManyToOne(() => PartEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'partId' })
  part!: PartEntity

  @Index()
  @Column({ type: 'integer' })
  siteId!: number

  @ManyToOne(() => SiteEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'siteId' })
  site!: SiteEntity

  @Column({ type: 'text' })
  condition!: StockCondition

  @Column({ type: 'text', nullable: true })
  grade!: string | null

  @Column({ type: 'integer', nullable: true })
  mileageKm!: number | null

  @Column({ type: 'text', nullable: true })
  donorVin!: string | null

  @Column({ type: 'integer', nullable: true })
  donorYear!: number | null

  @Column({ type: 'text', default: '' })
  damageNotes!: string

  @Column({ type: 'text', default: '' })
  location!: string

  /** Money in integer cents of the shop's one currency, never floating point. */
  @Column({ type: 'integer' })
  priceCents!: number

  @Column({ type: 'integer', default: 0 })
  coreChargeCents!: number

  @Column({ type: 'text', default: 'available' })
  status!: StockStatus

  @Index({ unique: true })
  @Column({ type: 'text', nullable: true })
  label!: string | null

  /** Until when an accepted quote holds the unit; past it the unit goes back on the shelf. */
  @Column({ type: Date, nullable: true })
  reservedUntil!: Date | null

  /** The import batch that wrote it last, if any; a revert checks the unit is as that batch left it. */
  @Index()
  @Column({ type: 'integer', nullable: true })
  batchId!: number | null

  @CreateDateColumn()
  createdAt!: Date

  @UpdateDateColumn()
  updatedAt!: Date
}
