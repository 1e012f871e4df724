import type { ModificationCaution } from '../../shared/schemas/fitment'
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm'
import type { ExtraPart, SkillLevel } from '../../shared/schemas/fitment'

/** A reusable, named piece of work a fit may call for. */
@Entity('modification')
export class ModificationEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  /** Natural key, as written in links files and rules (kebab-case). */
  @Column({ type: 'text', unique: true })
  name!: string

  @Column({ type: 'text' })
  title!: string

  @Column({ type: 'text', default: '' })
  summary!: string

  @Column({ type: 'simple-json' })
  steps!: string[]

  @Column({ type: 'simple-json' })
  extraParts!: ExtraPart[]

  @Column({ type: 'simple-json' })
  consumables!: string[]

  @Column({ type: 'text', default: 'skilled' })
  skillLevel!: SkillLevel

  @Column({ type: 'integer', nullable: true })
  timeMinutes!: number | null

  @Column({ type: 'simple-json' })
  cautions!: ModificationCaution[]

  /** Proposed until an editor completes it (an import may name one that does not exist yet). */
  @Column({ type: 'text', default: 'approved' })
  status!: 'approved' | 'proposed'

  /** 'rules' for the shipped catalogue, otherwise who or what created it. */
  @Column({ type: 'text', default: 'editor' })
  source!: string

  /** The import batch that proposed it, if any (a revert removes it again). */
  @Index()
  @Column({ type: 'integer', nullable: true })
  batchId!: number | null

  @CreateDateColumn()
  createdAt!: Date

  @UpdateDateColumn()
  updatedAt!: Date
}
