import type { ExplanationStep, Relation } from '../../shared/schemas/fitment'
import type { FitGraph, GraphIdentity, GraphLink } from './graph/fit-graph'
import type { IdentityDetail, LinkDetail } from './graph/fit-details'

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

/** The details an explanation quotes, read by id for the few links and identities it names. */
export type ChainDetails = { links: Map<number, LinkDetail>; identities: Map<number, IdentityDetail> }

/** A reviewed derivation: identities from the start to the link's member, the link, identities on to the end. */
export type Chain = { before: GraphIdentity[]; link: GraphLink; after: GraphIdentity[]; start: number; viaStart: number; viaEnd: number }

export function planChain(graph: FitGraph, start: number, viaStart: number, link: GraphLink, viaEnd: number, end: number): Chain {
  return { before: graph.identityChain(start, viaStart), link, after: graph.identityChain(viaEnd, end), start, viaStart, viaEnd }
}

/** Reads the details of every link and identity the chains name, in two statements. */
export async function loadChainDetails(graph: FitGraph, chains: Chain[]): Promise<ChainDetails> {
  const [links, identities] = await Promise.all([
    graph.details.links(chains.map((chain) => chain.link.id)),
    graph.details.identities(chains.flatMap((chain) => [...chain.before, ...chain.after].map((identity) => identity.id))),
  ])
  return { links, identities }
}

export function identityStep(
  graph: FitGraph,
  identity: GraphIdentity,
  detail: IdentityDetail | undefined,
  from: number,
  to: number,
): ExplanationStep {
  const a = graph.partNumberOf(from)
  const b = graph.partNumberOf(to)
  return {
    type: 'identity',
    text: `${a} is the same part as ${b}${detail?.note ? ` (${detail.note})` : ''}, so its links hold for both.`,
    from: a,
    to: b,
    source: detail?.source,
  }
}

export function linkStep(graph: FitGraph, link: GraphLink, detail: LinkDetail | undefined, from: number, to: number): ExplanationStep {
  const a = graph.partNumberOf(from)
  const b = graph.partNumberOf(to)
  const review = link.status === 'approved' ? 'reviewed link' : `${link.status} link, not yet reviewed`
  const modifications = detail?.modifications ?? []
  const mods = modifications.length ? `; needs ${modifications.join(', ')}` : ''
  const source = detail ? `, from the ${SOURCE_WORDS[detail.source] ?? detail.source}` : ''
  return {
    type: 'link',
    text: `${a} ${RELATION_WORDS[link.relation]} ${b} (${review}${source}${mods})${detail?.note ? `: ${detail.note}` : '.'}`,
    from: a,
    to: b,
    relation: link.relation,
    review: link.status,
    source: detail?.source,
    linkId: link.id,
  }
}

/** Identity steps along a chain of identity declarations, starting from `start`. */
function walkIdentities(graph: FitGraph, chain: GraphIdentity[], start: number, details: ChainDetails): ExplanationStep[] {
  let node = start
  return chain.map((identity) => {
    const next = identity.a === node ? identity.b : identity.a
    const step = identityStep(graph, identity, details.identities.get(identity.id), node, next)
    node = next
    return step
  })
}

/** Identity steps from the start to the member that holds the link, the link, then on to the end. */
export function chainSteps(graph: FitGraph, chain: Chain, details: ChainDetails): ExplanationStep[] {
  return [
    ...walkIdentities(graph, chain.before, chain.start, details),
    linkStep(graph, chain.link, details.links.get(chain.link.id), chain.viaStart, chain.viaEnd),
    ...walkIdentities(graph, chain.after, chain.viaEnd, details),
  ]
}
