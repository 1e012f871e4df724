import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm'

/** A place stock sits: a store of a chain, a lot of a salvage yard. */
@Entity('site')
export class SiteEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Column({ type: 'text', unique: true })
  name!: string

  @Column({ type: 'text', default: '' })
  address!: string

  @CreateDateColumn()
  createdAt!: Date
}
