import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm'
import { StockItemEntity } from './stock-item.entity'

/** One photo of a unit on the shelf (damage, casting marks, the donor), stored like a field report's: display size and thumbnail. */
@Entity('stock_photo')
export class StockPhotoEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Index()
  @Column({ type: 'integer' })
  stockItemId!: number

  @ManyToOne(() => StockItemEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'stockItemId' })
  stockItem!: StockItemEntity

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
