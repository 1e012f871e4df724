import cytoscape from 'cytoscape'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { FitGraph, type GraphIdentity, type GraphLink, type GraphPart } from '../../server/fitment/fit-graph'
import { reviewedFits, shortestFitPath } from '../../server/fitment/graph-search'

// Written out here, not imported: only approved fits carry a path.
const carriesPath = (link: GraphLink) => link.status === 'approved' && (link.relation === 'fits' || link.relation === 'fits-with-modification')

/*
 * Reference: cytoscape.js headless (a general-purpose graph library) on the
 * same random graphs. Our traversals run on plain adjacency lists for speed;
 * these properties check they agree with the library's Dijkstra and
 * connected components.
 */

type RandomGraph = { size: number; links: GraphLink[]; identities: GraphIdentity[] }

const pairArb = (size: number) =>
  fc.tuple(fc.integer({ min: 1, max: size }), fc.integer({ min: 1, max: size })).filter(([a, b]) => a !== b)

const graphArb: fc.Arbitrary<RandomGraph> = fc.integer({ min: 2, max: 18 }).chain((size) =>
  fc
    .record({
      links: fc.uniqueArray(
        fc.record({
          pair: pairArb(size),
          relation: fc.constantFrom('fits', 'fits-with-modification', 'does-not-fit' as const),
          status: fc.constantFrom('approved', 'approved', 'proposed', 'rejected' as const),
        }),
        { maxLength: 30, selector: (l) => [Math.min(...l.pair), Math.max(...l.pair)].join('-') },
      ),
      identities: fc.uniqueArray(pairArb(size), { maxLength: 6, selector: (p) => [Math.min(...p), Math.max(...p)].join('-') }),
    })
    .map(({ links, identities }) => ({
      size,
      links: links.map((l, index) => ({
        id: index + 1,
        a: Math.min(...l.pair),
        b: Math.max(...l.pair),
        relation: l.relation,
        status: l.status,
        source: 'editor' as const,
        note: '',
        modifications: [],
      })),
      identities: identities.map((p, index) => ({ id: index + 1, a: Math.min(...p), b: Math.max(...p), note: '', source: 'editor' as const })),
    })),
)

function parts(size: number): GraphPart[] {
  return Array.from({ length: size }, (_, i) => ({ id: i + 1, partNumber: `P-${i + 1}`, kind: 'other', name: `Part ${i + 1}`, family: '' }))
}

function cy(g: RandomGraph, edges: { id: string; source: number; target: number; weight: number }[]) {
  return cytoscape({
    headless: true,
    elements: [
      ...parts(g.size).map((p) => ({ data: { id: String(p.id) } })),
      ...edges.map((e) => ({ data: { id: e.id, source: String(e.source), target: String(e.target), weight: e.weight } })),
    ],
  })
}

describe('shortestFitPath against cytoscape dijkstra (cytoscape.js headless as reference)', () => {
  it('finds a path exactly when the library does, with the same number of fit links', () => {
    fc.assert(
      fc.property(graphArb, fc.integer({ min: 1, max: 18 }), fc.integer({ min: 1, max: 18 }), (g, rawFrom, rawTo) => {
        const from = ((rawFrom - 1) % g.size) + 1
        const to = ((rawTo - 1) % g.size) + 1
        const graph = new FitGraph(parts(g.size), g.links, g.identities)
        const reference = cy(g, [
          ...g.links.filter(carriesPath).map((l) => ({ id: `l${l.id}`, source: l.a, target: l.b, weight: 1 })),
          ...g.identities.map((i) => ({ id: `i${i.id}`, source: i.a, target: i.b, weight: 0 })),
        ])
        const dijkstra = reference.elements().dijkstra({
          root: reference.getElementById(String(from)),
          weight: (edge) => edge.data('weight') as number,
          directed: false,
        })
        const expected = dijkstra.distanceTo(reference.getElementById(String(to)))
        const steps = shortestFitPath(graph, from, to)
        if (!Number.isFinite(expected)) return steps === null
        if (steps === null) return false
        // The chain is connected, starts and ends right, and uses only approved fit links and identities.
        let node = from
        for (const step of steps) {
          if (step.from !== node) return false
          if (step.type === 'link' && !carriesPath(step.link)) return false
          node = step.to
        }
        return node === to && steps.filter((s) => s.type === 'link').length === expected
      }),
      { numRuns: 300 },
    )
  })
})

describe('reviewedFits against cytoscape connected components (identity classes)', () => {
  it('reaches exactly the parts identical to the other end of a non-rejected link of the part or of a part identical to it', () => {
    fc.assert(
      fc.property(graphArb, fc.integer({ min: 1, max: 18 }), (g, raw) => {
        const part = ((raw - 1) % g.size) + 1
        const graph = new FitGraph(parts(g.size), g.links, g.identities)
        const identityGraph = cy(g, g.identities.map((i) => ({ id: `i${i.id}`, source: i.a, target: i.b, weight: 0 })))
        const componentOf = new Map<number, Set<number>>()
        for (const component of identityGraph.elements().components()) {
          const ids = new Set(component.nodes().map((n) => Number(n.id())))
          for (const id of ids) componentOf.set(id, ids)
        }
        const own = componentOf.get(part)!
        const expected = new Set<number>()
        for (const link of g.links) {
          if (link.status === 'rejected') continue
          for (const [x, y] of [[link.a, link.b], [link.b, link.a]] as const) {
            if (own.has(x) && !own.has(y)) for (const id of componentOf.get(y)!) expected.add(id)
          }
        }
        const found = reviewedFits(graph, part)
        expect([...found.keys()].sort((a, b) => a - b)).toEqual([...expected].sort((a, b) => a - b))
        for (const fit of found.values()) {
          // The deciding link joins the part's class to the target's class.
          expect(own.has(fit.member)).toBe(true)
          expect(componentOf.get(fit.target)!.has(fit.other)).toBe(true)
          expect([fit.link.a, fit.link.b].sort()).toEqual([fit.member, fit.other].sort())
        }
      }),
      { numRuns: 300 },
    )
  })

  it('prefers an approved link over a proposed one for the same target', () => {
    const graph = new FitGraph(
      parts(3),
      [
        { id: 1, a: 1, b: 2, relation: 'fits', status: 'proposed', source: 'field-report', note: '', modifications: [] },
        { id: 2, a: 1, b: 3, relation: 'does-not-fit', status: 'approved', source: 'editor', note: '', modifications: [] },
      ],
      [{ id: 1, a: 2, b: 3, note: '', source: 'editor' }],
    )
    const found = reviewedFits(graph, 1)
    expect(found.get(2)!.link.id).toBe(2)
    expect(found.get(3)!.link.id).toBe(2)
  })
})
