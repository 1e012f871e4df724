import { Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm'
import { PartEntity } from './part.entity'

/** One word of a part's name or family, lower case: the index behind search by word prefix (covering: word, then part). */
@Entity('part_word')
@Index(['word', 'partId'])
export class PartWordEntity {
  @PrimaryColumn({ type: 'integer' })
  partId!: number

  @ManyToOne(() => PartEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'partId' })
  part!: PartEntity

  @PrimaryColumn({ type: 'text' })
  word!: string
}
