import type { ExplanationStep, Relation } from '../../shared/schemas/fitment'
import type { FitGraph, GraphIdentity, GraphLink } from './fit-graph'

export const RELATION_WORDS: Record<Relation, string> = {
  fits: 'fits',
  'fits-with-modification': 'fits with modification',
  'does-not-fit': 'does not fit',
}

const SOURCE_WORDS: Record<string, string> = {
  demo: 'demo catalogue',
  import: 'import batch',
  'field-report': 'field report',
  editor: 'editor',
}

export function identityStep(graph: FitGraph, identity: GraphIdentity, from: number, to: number): ExplanationStep {
  const a = graph.part(from).partNumber
  const b = graph.part(to).partNumber
  return {
    type: 'identity',
    text: `${a} is the same part as ${b}${identity.note ? ` (${identity.note})` : ''}, so its links hold for both.`,
    from: a,
    to: b,
    source: identity.source,
  }
}

export function linkStep(graph: FitGraph, link: GraphLink, from: number, to: number): ExplanationStep {
  const a = graph.part(from).partNumber
  const b = graph.part(to).partNumber
  const review = link.status === 'approved' ? 'reviewed link' : `${link.status} link, not yet reviewed`
  const mods = link.modifications.length ? `; needs ${link.modifications.join(', ')}` : ''
  return {
    type: 'link',
    text: `${a} ${RELATION_WORDS[link.relation]} ${b} (${review}, from the ${SOURCE_WORDS[link.source] ?? link.source}${mods})${link.note ? `: ${link.note}` : '.'}`,
    from: a,
    to: b,
    relation: link.relation,
    review: link.status,
    source: link.source,
    linkId: link.id,
  }
}

/** Identity steps along a chain of identity declarations, starting from `start`. */
export function walkIdentities(graph: FitGraph, chain: GraphIdentity[], start: number): ExplanationStep[] {
  let node = start
  return chain.map((identity) => {
    const next = identity.a === node ? identity.b : identity.a
    const step = identityStep(graph, identity, node, next)
    node = next
    return step
  })
}

/** Identity steps from `start` to the member that holds the link, the link, then on to `end`. */
export function chainSteps(graph: FitGraph, start: number, viaStart: number, link: GraphLink, viaEnd: number, end: number) {
  return [
    ...walkIdentities(graph, graph.identityChain(start, viaStart), start),
    linkStep(graph, link, viaStart, viaEnd),
    ...walkIdentities(graph, graph.identityChain(viaEnd, end), viaEnd),
  ]
}
