import { Entity, Index, PrimaryColumn } from 'typeorm'

/** A stock unit a quote names: lets a revert or an edit find the quotes that lean on a unit without reading their bodies. */
@Entity('quote_unit')
export class QuoteUnitEntity {
  @PrimaryColumn({ type: 'integer' })
  quoteId!: number

  @Index()
  @PrimaryColumn({ type: 'integer' })
  stockItemId!: number
}
