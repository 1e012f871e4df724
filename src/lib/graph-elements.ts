import type { ElementDefinition } from 'cytoscape'
import type { GraphEdge, GraphNode } from '@shared/schemas/graph'
import { PART_KIND_LABELS } from '@shared/schemas/part-kinds'
import { FIT_LOOKS, type FitLook } from './relations'

export type GraphAnswer = { nodes: GraphNode[]; edges: GraphEdge[] }

/** The relation an edge stands for: identities are their own kind of edge. */
export function edgeLook(edge: GraphEdge): FitLook {
  if (edge.type === 'identity') return 'identical'
  return edge.relation ?? 'unknown'
}

export function edgeLabel(edge: GraphEdge): string {
  const look = FIT_LOOKS[edgeLook(edge)]
  const proposed = edge.review === 'proposed' ? ' (proposed)' : ''
  return `${look.glyph} ${look.short}${proposed}`
}

export type ElementOptions = {
  /** Parts drawn as the centre besides distance 0: both ends of a path. */
  highlight?: readonly string[]
  /** In a neighbourhood, parts two steps out get a dashed outline; along a path distance means nothing. */
  mode?: 'neighbourhood' | 'path'
}

/**
 * The server's answer as cytoscape elements. Classes carry everything the
 * stylesheet needs (relation, review, centre, distance), so the style stays a pure table.
 */
export function toGraphElements(answer: GraphAnswer, { highlight = [], mode = 'neighbourhood' }: ElementOptions = {}): ElementDefinition[] {
  const ids = new Set(answer.nodes.map((node) => node.id))
  const nodes: ElementDefinition[] = answer.nodes.map((node) => ({
    group: 'nodes',
    data: {
      id: node.id,
      label: `${node.partNumber}\n${PART_KIND_LABELS[node.kind]}`,
      partNumber: node.partNumber,
      name: node.name,
      kind: node.kind,
      family: node.family,
      distance: node.distance,
    },
    classes: [
      `kind-${node.kind}`,
      node.distance === 0 || highlight.includes(node.id) ? 'centre' : mode === 'path' ? '' : `distance-${Math.min(node.distance, 2)}`,
    ]
      .filter(Boolean)
      .join(' '),
  }))
  // An edge to a node the server left out (capped views) would make cytoscape throw.
  const edges: ElementDefinition[] = answer.edges
    .filter((edge) => ids.has(edge.source) && ids.has(edge.target))
    .map((edge) => {
      const look = edgeLook(edge)
      return {
        group: 'edges',
        data: {
          id: edge.id,
          source: edge.source,
          target: edge.target,
          look,
          label: edgeLabel(edge),
          note: edge.note ?? '',
          review: edge.review ?? '',
          modifications: edge.modifications ?? [],
        },
        classes: [`look-${look}`, edge.review === 'proposed' ? 'proposed' : ''].filter(Boolean).join(' '),
      }
    })
  return [...nodes, ...edges]
}

/** Above this many elements the view trades animation and labels at low zoom for speed. */
export const LARGE_GRAPH_ELEMENTS = 400

export function isLargeGraph(answer: GraphAnswer): boolean {
  return answer.nodes.length + answer.edges.length > LARGE_GRAPH_ELEMENTS
}

/**
 * Positions for a path: one column per step from the start, identical numbers
 * stacked in the same column, so the chain reads left to right without a layout run.
 */
export function pathPositions(
  nodes: readonly { id: string; distance: number }[],
  gapX = 230,
  gapY = 90,
): Record<string, { x: number; y: number }> {
  const columns = new Map<number, string[]>()
  for (const node of nodes) columns.set(node.distance, [...(columns.get(node.distance) ?? []), node.id])
  const positions: Record<string, { x: number; y: number }> = {}
  for (const [distance, ids] of columns) {
    ids.forEach((id, index) => {
      positions[id] = { x: distance * gapX, y: (index - (ids.length - 1) / 2) * gapY }
    })
  }
  return positions
}

/**
 * Rings for a big neighbourhood: the centre, then each distance in rings of
 * growing size (an outer ring holds more parts), so hundreds of parts two
 * steps out do not become one circle too wide to read. 0 is the centre ring.
 */
export function ringIndex(nodes: readonly { id: string; distance: number }[], first = 16, growth = 8): Record<string, number> {
  const rings: Record<string, number> = {}
  let ring = 0
  const distances = [...new Set(nodes.map((node) => node.distance))].sort((a, b) => a - b)
  for (const distance of distances) {
    let capacity = first
    let used = 0
    for (const node of nodes.filter((n) => n.distance === distance)) {
      if (used === capacity) {
        ring++
        used = 0
        capacity += growth
      }
      rings[node.id] = ring
      used++
    }
    ring++
  }
  return rings
}
