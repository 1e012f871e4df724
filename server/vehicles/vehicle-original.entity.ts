import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm'
import { PartEntity } from '../catalogue/part.entity'
import { VehicleApplicationEntity } from './vehicle-application.entity'

/** The part a vehicle application left the factory with in one slot of the build template. */
@Entity('vehicle_original')
export class VehicleOriginalEntity {
  @PrimaryColumn({ type: 'integer' })
  vehicleId!: number

  @ManyToOne(() => VehicleApplicationEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vehicleId' })
  vehicle!: VehicleApplicationEntity

  @PrimaryColumn({ type: 'text' })
  slot!: string

  @Index()
  @Column({ type: 'integer' })
  partId!: number

  @ManyToOne(() => PartEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'partId' })
  part!: PartEntity
}
