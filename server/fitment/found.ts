import type { ExplanationStep, Relation } from '../../shared/schemas/fitment'

/** One answer of what fits, before the parts and modifications it names are loaded. */
export type Found = {
  partId: number
  relation: Relation
  decidedBy: 'link' | 'rule'
  review: 'approved' | 'proposed' | 'inferred'
  ruleIds: string[]
  modificationNames: string[]
  explanation: ExplanationStep[]
}
