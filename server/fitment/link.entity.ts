import {
  Check,
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  JoinTable,
  ManyToMany,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm'
import type { LinkSource, Relation, ReviewStatus } from '../../shared/schemas/fitment'
import { ModificationEntity } from '../catalogue/modification.entity'
import { PartEntity } from '../catalogue/part.entity'

/**
 * A fit between two parts. Fit is mutual, so a pair is stored once with the
 * lower part id first.
 */
@Entity('link')
@Index(['partAId', 'partBId'], { unique: true })
@Check('"partAId" < "partBId"')
export class LinkEntity {
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

  @Column({ type: 'text' })
  relation!: Relation

  @ManyToMany(() => ModificationEntity)
  @JoinTable({ name: 'link_modification', joinColumn: { name: 'linkId' }, inverseJoinColumn: { name: 'modificationId' } })
  modifications!: ModificationEntity[]

  @Column({ type: 'text', default: '' })
  note!: string

  @Column({ type: 'text' })
  source!: LinkSource

  /** The import batch that wrote it last, if any. */
  @Index()
  @Column({ type: 'integer', nullable: true })
  batchId!: number | null

  @Index()
  @Column({ type: 'text', default: 'approved' })
  status!: ReviewStatus

  @CreateDateColumn()
  createdAt!: Date

  @UpdateDateColumn()
  updatedAt!: Date
}
