import { describe, expect, it } from 'vitest'
import type { GraphEdge, GraphNode } from '@shared/schemas/graph'
import { edgeLabel, isLargeGraph, pathPositions, ringIndex, toGraphElements } from '@/lib/graph-elements'
import { graphStylesheet } from '@/lib/graph-style'
import { FIT_LOOKS } from '@/lib/relations'

function node(id: string, distance: number): GraphNode {
  return { id, partNumber: id, name: `${id} name`, kind: 'head', family: 'ZX', distance }
}
function link(
  id: string,
  source: string,
  target: string,
  relation: GraphEdge['relation'],
  review: GraphEdge['review'] = 'approved',
): GraphEdge {
  return { id, source, target, type: 'link', relation, review, modifications: [] }
}

describe('graph elements', () => {
  const answer = {
    nodes: [node('ZX-1', 0), node('ZX-2', 1), node('ZX-3', 2), node('ZX-4', 1)],
    edges: [
      link('link-1', 'ZX-1', 'ZX-2', 'fits'),
      link('link-2', 'ZX-2', 'ZX-3', 'fits-with-modification'),
      link('link-3', 'ZX-1', 'ZX-4', 'does-not-fit', 'proposed'),
      { id: 'identity-1', source: 'ZX-1', target: 'ZX-4', type: 'identity' } satisfies GraphEdge,
    ],
  }

  it('marks the centre and rings the parts by distance in a neighbourhood', () => {
    const nodes = toGraphElements(answer).filter((element) => element.group === 'nodes')
    expect(nodes.map((n) => [n.data.id, n.classes])).toEqual([
      ['ZX-1', 'kind-head centre'],
      ['ZX-2', 'kind-head distance-1'],
      ['ZX-3', 'kind-head distance-2'],
      ['ZX-4', 'kind-head distance-1'],
    ])
    expect(nodes[0]?.data.label).toBe('ZX-1\nCylinder head')
  })

  it('gives every edge its relation as a class and a label with a glyph and words, proposed links saying so', () => {
    const edges = toGraphElements(answer).filter((element) => element.group === 'edges')
    expect(edges.map((e) => [e.data.id, e.classes, e.data.label])).toEqual([
      ['link-1', 'look-fits', '✓ fits'],
      ['link-2', 'look-fits-with-modification', '◆ with mod.'],
      ['link-3', 'look-does-not-fit proposed', '✕ no fit (proposed)'],
      ['identity-1', 'look-identical', '≡ same part'],
    ])
  })

  it('drops an edge whose end the server left out of a capped view, instead of failing to draw', () => {
    const capped = { nodes: [node('ZX-1', 0)], edges: [link('link-9', 'ZX-1', 'ZX-99', 'fits')] }
    expect(toGraphElements(capped).filter((element) => element.group === 'edges')).toEqual([])
  })

  it('draws both ends of a path as centres and no distance rings along it', () => {
    const path = { nodes: [node('ZX-1', 0), node('ZX-2', 1), node('ZX-3', 2)], edges: [] }
    const classes = toGraphElements(path, { highlight: ['ZX-1', 'ZX-3'], mode: 'path' }).map((element) => element.classes)
    expect(classes).toEqual(['kind-head centre', 'kind-head', 'kind-head centre'])
  })

  it('lays a path out left to right, stacking identical numbers in one column', () => {
    expect(pathPositions([node('A', 0), node('B', 1), node('B2', 1), node('C', 2)], 100, 50)).toEqual({
      A: { x: 0, y: 0 },
      B: { x: 100, y: -25 },
      B2: { x: 100, y: 25 },
      C: { x: 200, y: 0 },
    })
  })

  it('tells relations apart by line style and end marker, not only by colour', () => {
    const looks = Object.values(FIT_LOOKS).map((look) => `${look.line}/${look.marker}/${look.glyph}`)
    expect(new Set(looks).size).toBe(looks.length)
    const palette = {
      text: '#000',
      surface: '#fff',
      border: '#777',
      node: '#eee',
      centre: '#fb0',
      centreText: '#000',
      looks: { fits: '#111', 'fits-with-modification': '#111', 'does-not-fit': '#111', unknown: '#111', identical: '#111' },
    }
    const sheet = graphStylesheet(palette, false)
    const style = (selector: string) => sheet.find((block) => 'selector' in block && block.selector === selector)
    expect(style('edge.look-fits-with-modification')).toMatchObject({ style: { 'line-style': 'dashed', 'target-arrow-shape': 'diamond' } })
    expect(style('edge.look-does-not-fit')).toMatchObject({ style: { 'line-style': 'dotted', 'target-arrow-shape': 'tee' } })
    expect(style('edge.look-identical')).toMatchObject({ style: { 'line-outline-color': '#111' } })
  })

  it('treats a capped neighbourhood (600 parts, 1400 links) as large, so the canvas trades animation for speed', () => {
    const nodes = Array.from({ length: 600 }, (_, i) => node(`N${i}`, 1))
    const edges = Array.from({ length: 1400 }, (_, i) => link(`L${i}`, `N${i % 600}`, `N${(i * 7 + 1) % 600}`, 'fits'))
    expect(isLargeGraph({ nodes, edges })).toBe(true)
    expect(isLargeGraph(answer)).toBe(false)
    expect(toGraphElements({ nodes, edges })).toHaveLength(2000)
  })

  it('labels an edge without a relation as unknown rather than as fitting', () => {
    expect(edgeLabel({ id: 'x', source: 'a', target: 'b', type: 'link' })).toBe('? unknown')
  })
})

describe('rings for a big neighbourhood', () => {
  it('puts the centre alone, then each distance in rings that grow outwards', () => {
    const nodes = [
      { id: 'C', distance: 0 },
      ...Array.from({ length: 5 }, (_, i) => ({ id: `A${i}`, distance: 1 })),
      ...Array.from({ length: 9 }, (_, i) => ({ id: `B${i}`, distance: 2 })),
    ]
    const rings = ringIndex(nodes, 2, 1)
    expect(rings.C).toBe(0)
    // distance 1: rings of 2, then 3 parts
    expect(['A0', 'A1', 'A2', 'A3', 'A4'].map((id) => rings[id])).toEqual([1, 1, 2, 2, 2])
    // distance 2 starts a new ring even though the last one had room: rings of 2, 3, 4
    expect(
      Object.entries(rings)
        .filter(([id]) => id.startsWith('B'))
        .map(([, ring]) => ring),
    ).toEqual([3, 3, 4, 4, 4, 5, 5, 5, 5])
  })
})
