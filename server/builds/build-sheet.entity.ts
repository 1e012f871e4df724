import { FLOAT_COLUMN } from '../db/column-types'
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm'
import { UserEntity } from '../users/user.entity'
import type { FaceFinish } from '../../shared/schemas/build'

/** A technician's saved target combination. */
@Entity('build_sheet')
export class BuildSheetEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Index()
  @Column({ type: 'integer' })
  ownerId!: number

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'ownerId' })
  owner!: UserEntity

  @Column({ type: 'text' })
  name!: string

  /** Slot -> part number. */
  @Column({ type: 'simple-json' })
  slots!: Record<string, string>

  @Column({ type: FLOAT_COLUMN, nullable: true })
  targetPowerKw!: number | null

  @Column({ type: FLOAT_COLUMN, nullable: true })
  fuelOctane!: number | null

  @Column({ type: 'integer', nullable: true })
  chassisModelYear!: number | null

  @Column({ type: 'text', nullable: true })
  vin!: string | null

  /** The vehicle application the build was planned from, if any (its make and model go on a quote). */
  @Column({ type: 'integer', nullable: true })
  vehicleId!: number | null

  /** Deck and head face as measured (roughness and out-of-flat), null when not measured. */
  @Column({ type: 'simple-json', nullable: true })
  faceFinish!: FaceFinish | null

  @Column({ type: 'text', default: '' })
  notes!: string

  /** Ticked checklist steps: modification name -> step indexes. */
  @Column({ type: 'simple-json', default: '{}' })
  checklist!: Record<string, number[]>

  /** The verdict and the labour (minutes, from the modifications' estimates) when the sheet was last saved, for the list. */
  @Column({ type: 'text', nullable: true })
  savedVerdict!: string | null

  @Column({ type: 'integer', nullable: true })
  labourMinutes!: number | null

  @CreateDateColumn()
  createdAt!: Date

  @UpdateDateColumn()
  updatedAt!: Date
}
