import {
  MAX_NEIGHBOURHOOD_EDGES,
  MAX_NEIGHBOURHOOD_NODES,
  type GraphEdge,
  type GraphNode,
  type GraphPath,
  type Neighbourhood,
} from '../../shared/schemas/graph'
import type { FitGraph, FitGraphIndex, GraphIdentity, GraphLink } from './fit-graph'
import { neighbourhoodOf, shortestFitPath } from './graph-search'
import type { PartService } from '../catalogue/part.service'

function linkEdge(graph: FitGraph, link: GraphLink, detail: { note: string; modifications: string[] } | undefined): GraphEdge {
  return {
    id: `link-${link.id}`,
    source: graph.partNumberOf(link.a),
    target: graph.partNumberOf(link.b),
    type: 'link',
    relation: link.relation,
    review: link.status,
    note: detail?.note || undefined,
    modifications: detail?.modifications ?? [],
  }
}

function identityEdge(graph: FitGraph, identity: GraphIdentity, detail: { note: string } | undefined): GraphEdge {
  return {
    id: `identity-${identity.id}`,
    source: graph.partNumberOf(identity.a),
    target: graph.partNumberOf(identity.b),
    type: 'identity',
    note: detail?.note || undefined,
  }
}

export class GraphService {
  constructor(
    private readonly parts: PartService,
    private readonly graphIndex: FitGraphIndex,
  ) {}

  /** The edges' notes and modifications, read only for the edges an answer returns. */
  private async edges(graph: FitGraph, links: GraphLink[], identities: GraphIdentity[]): Promise<Map<string, GraphEdge>> {
    const [linkDetails, identityDetails] = await Promise.all([
      graph.details.links(links.map((link) => link.id)),
      graph.details.identities(identities.map((identity) => identity.id)),
    ])
    const edges = new Map<string, GraphEdge>()
    for (const identity of identities) edges.set(`identity-${identity.id}`, identityEdge(graph, identity, identityDetails.get(identity.id)))
    for (const link of links) edges.set(`link-${link.id}`, linkEdge(graph, link, linkDetails.get(link.id)))
    return edges
  }

  /** Name and family come from the catalogue rows, for the nodes shown only. */
  private async nodes(graph: FitGraph, distances: [number, number][]): Promise<GraphNode[]> {
    const labels = await this.parts.labels(distances.map(([id]) => id))
    return distances.map(([id, distance]) => {
      const partNumber = graph.partNumberOf(id)
      const label = labels.get(id)
      return { id: partNumber, partNumber, name: label?.name ?? partNumber, kind: graph.kindOf(id), family: label?.family ?? '', distance }
    })
  }

  /** Shortest chain of approved fit links between two parts (see shortestFitPath). */
  async path(fromCode: string, toCode: string): Promise<GraphPath> {
    const [from, to] = [await this.parts.requireId(fromCode, 'from'), await this.parts.requireId(toCode, 'to')]
    const graph = await this.graphIndex.snapshot()
    const fromNumber = graph.partNumberOf(from)
    const toNumber = graph.partNumberOf(to)
    const steps = shortestFitPath(graph, from, to)
    if (!steps) {
      return {
        from: fromNumber,
        to: toNumber,
        found: false,
        nodes: await this.nodes(graph, [
          [from, 0],
          [to, 0],
        ]),
        edges: [],
        message: `No chain of reviewed fit links joins ${fromNumber} and ${toNumber}.`,
      }
    }
    const byId = await this.edges(
      graph,
      steps.flatMap((step) => (step.type === 'link' ? [step.link] : [])),
      steps.flatMap((step) => (step.type === 'identity' ? [step.identity] : [])),
    )
    const edges = steps.map((step) => byId.get(step.type === 'link' ? `link-${step.link.id}` : `identity-${step.identity.id}`)!)
    const links = steps.filter((step) => step.type === 'link').length
    return {
      from: fromNumber,
      to: toNumber,
      found: true,
      nodes: await this.nodes(
        graph,
        [from, ...steps.map((step) => step.to)].map((id, index) => [id, index]),
      ),
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
    const found = neighbourhoodOf(graph, entity.id, depth, MAX_NEIGHBOURHOOD_NODES, MAX_NEIGHBOURHOOD_EDGES)
    const edges = await this.edges(
      graph,
      found.linkSlots.map((slot) => graph.linkAt(slot)),
      found.identitySlots.map((slot) => graph.identityAt(slot)),
    )
    return {
      centre: entity.partNumber,
      depth,
      nodes: await this.nodes(graph, [...found.distance]),
      edges: [...edges.values()],
      capped: found.capped,
      message: found.capped
        ? `Showing the first ${found.distance.size} parts and ${edges.size} links; the neighbourhood is larger. Narrow it with depth 1 or open a neighbouring part.`
        : undefined,
    }
  }
}
