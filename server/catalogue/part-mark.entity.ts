import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm'
import type { MarkType } from '../../shared/schemas/part'
import { PartEntity } from './part.entity'

/** A casting or forging number, a stamped code or a superseded number found on or for a part. */
@Entity('part_mark')
@Index(['partId', 'type', 'value'], { unique: true })
export class PartMarkEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Column({ type: 'integer' })
  partId!: number

  @ManyToOne(() => PartEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'partId' })
  part!: PartEntity

  @Column({ type: 'text' })
  type!: MarkType

  @Column({ type: 'text' })
  value!: string

  @Index()
  @Column({ type: 'text' })
  valueKey!: string
}
