import {
  MAX_NEIGHBOURHOOD_EDGES,
  MAX_NEIGHBOURHOOD_NODES,
  type GraphEdge,
  type GraphNode,
  type GraphPath,
  type Neighbourhood,
} from '../../shared/schemas/graph'
import type { FitGraph, GraphIdentity, GraphLink } from './fit-graph'
import type { FitGraphIndex } from './fit-graph'
import { shortestFitPath } from './graph-search'
import type { PartService } from '../catalogue/part.service'

function linkEdge(graph: FitGraph, link: GraphLink): GraphEdge {
  return {
    id: `link-${link.id}`,
    source: graph.part(link.a).partNumber,
    target: graph.part(link.b).partNumber,
    type: 'link',
    relation: link.relation,
    review: link.status,
    note: link.note || undefined,
    modifications: link.modifications,
  }
}

function identityEdge(graph: FitGraph, identity: GraphIdentity): GraphEdge {
  return {
    id: `identity-${identity.id}`,
    source: graph.part(identity.a).partNumber,
    target: graph.part(identity.b).partNumber,
    type: 'identity',
    note: identity.note || undefined,
  }
}

function node(graph: FitGraph, id: number, distance: number): GraphNode {
  const part = graph.part(id)
  return { id: part.partNumber, partNumber: part.partNumber, name: part.name, kind: part.kind, family: part.family, distance }
}

export class GraphService {
  constructor(
    private readonly parts: PartService,
    private readonly graphIndex: FitGraphIndex,
  ) {}

  /** Shortest chain of approved fit links between two parts (see shortestFitPath). */
  async path(fromCode: string, toCode: string): Promise<GraphPath> {
    const [from, to] = [await this.parts.requireId(fromCode, 'from'), await this.parts.requireId(toCode, 'to')]
    const graph = await this.graphIndex.snapshot()
    const fromNumber = graph.part(from).partNumber
    const toNumber = graph.part(to).partNumber
    const steps = shortestFitPath(graph, from, to)
    if (!steps) {
      return {
        from: fromNumber,
        to: toNumber,
        found: false,
        nodes: [node(graph, from, 0), node(graph, to, 0)],
        edges: [],
        message: `No chain of reviewed fit links joins ${fromNumber} and ${toNumber}.`,
      }
    }
    const edges = steps.map((step) => (step.type === 'link' ? linkEdge(graph, step.link) : identityEdge(graph, step.identity)))
    const links = steps.filter((step) => step.type === 'link').length
    return {
      from: fromNumber,
      to: toNumber,
      found: true,
      nodes: [from, ...steps.map((step) => step.to)].map((id, index) => node(graph, id, index)),
      edges,
      message:
        from === to
          ? `${fromNumber} is the part itself.`
          : `${fromNumber} reaches ${toNumber} through ${links} fit link${links === 1 ? '' : 's'}${edges.length > links ? ' and identical part numbers' : ''}.`,
    }
  }

  /** Parts within one or two links or identities of a part, capped so a view stays usable. */
  async neighbourhood(code: string, depth: number): Promise<Neighbourhood> {
    const entity = await this.parts.requireEntity(code)
    const graph = await this.graphIndex.snapshot()
    const distance = new Map<number, number>([[entity.id, 0]])
    let frontier = [entity.id]
    let capped = false
    for (let level = 1; level <= depth && !capped; level++) {
      const next: number[] = []
      for (const id of frontier) {
        const neighbours = [
          ...graph.identitiesOf(id).map((i) => (i.a === id ? i.b : i.a)),
          ...graph.linksOf(id).filter((l) => l.status !== 'rejected').map((l) => (l.a === id ? l.b : l.a)),
        ]
        for (const neighbour of neighbours) {
          if (distance.has(neighbour)) continue
          if (distance.size >= MAX_NEIGHBOURHOOD_NODES) {
            capped = true
            break
          }
          distance.set(neighbour, level)
          next.push(neighbour)
        }
        if (capped) break
      }
      frontier = next
    }
    const edges = new Map<string, GraphEdge>()
    for (const id of distance.keys()) {
      for (const identity of graph.identitiesOf(id)) {
        if (distance.has(identity.a) && distance.has(identity.b)) edges.set(`identity-${identity.id}`, identityEdge(graph, identity))
      }
      for (const link of graph.linksOf(id)) {
        if (link.status !== 'rejected' && distance.has(link.a) && distance.has(link.b)) edges.set(`link-${link.id}`, linkEdge(graph, link))
      }
    }
    let edgeList = [...edges.values()]
    if (edgeList.length > MAX_NEIGHBOURHOOD_EDGES) {
      capped = true
      edgeList = edgeList.slice(0, MAX_NEIGHBOURHOOD_EDGES)
    }
    return {
      centre: entity.partNumber,
      depth,
      nodes: [...distance].map(([id, d]) => node(graph, id, d)),
      edges: edgeList,
      capped,
      message: capped
        ? `Showing the first ${distance.size} parts and ${edgeList.length} links; the neighbourhood is larger. Narrow it with depth 1 or open a neighbouring part.`
        : undefined,
    }
  }
}
