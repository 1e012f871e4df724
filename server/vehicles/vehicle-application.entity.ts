import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'

/** Cars of some model years that left the factory with the same parts (slot by slot, in vehicle_original). */
@Entity('vehicle_application')
@Index(['make', 'model'])
export class VehicleApplicationEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Index()
  @Column({ type: 'integer' })
  yearFrom!: number

  @Column({ type: 'integer' })
  yearTo!: number

  @Column({ type: 'text' })
  make!: string

  @Column({ type: 'text' })
  model!: string

  @Column({ type: 'text', default: '' })
  body!: string

  @Column({ type: 'text', default: '' })
  market!: string

  @Column({ type: 'text' })
  engineFamily!: string

  /** The import batch that wrote it last, if any. */
  @Index()
  @Column({ type: 'integer', nullable: true })
  batchId!: number | null
}
