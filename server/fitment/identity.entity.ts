import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm'
import type { LinkSource } from '../../shared/schemas/fitment'
import { PartEntity } from '../catalogue/part.entity'

/**
 * Two numbers for the same part (a superseded number, a remanufactured or dealer
 * number). Kept apart from fit links: identity is transitive, fit is not.
 */
@Entity('part_identity')
@Index(['partAId', 'partBId'], { unique: true })
@Check('"partAId" < "partBId"')
export class IdentityEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Column({ type: 'integer' })
  partAId!: number

  @ManyToOne(() => PartEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'partAId' })
  partA!: PartEntity

  @Index()
  @Column({ type: 'integer' })
  partBId!: number

  @ManyToOne(() => PartEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'partBId' })
  partB!: PartEntity

  @Column({ type: 'text', default: '' })
  note!: string

  @Column({ type: 'text' })
  source!: LinkSource

  @Index()
  @Column({ type: 'integer', nullable: true })
  batchId!: number | null

  @CreateDateColumn()
  createdAt!: Date
}
