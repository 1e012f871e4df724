import cytoscape from 'cytoscape'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { FitGraph, type FitDetails, type GraphIdentity, type GraphLink, type GraphPart } from '../../server/fitment/fit-graph'
import { neighbourhoodOf, reviewedFits, shortestFitPath } from '../../server/fitment/graph-search'

// Written out here, not imported: only approved fits carry a path.
const carriesPath = (link: GraphLink) =>
  link.status === 'approved' && (link.relation === 'fits' || link.relation === 'fits-with-modification')

/*
 * Reference: cytoscape.js headless (a general-purpose graph library) on the
 * same random graphs. Our traversals run on plain adjacency lists for speed;
 * these properties check they agree with the library's Dijkstra and
 * connected components.
 */

type RandomGraph = { size: number; links: GraphLink[]; identities: GraphIdentity[] }

const pairArb = (size: number) => fc.tuple(fc.integer({ min: 1, max: size }), fc.integer({ min: 1, max: size })).filter(([a, b]) => a !== b)

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
      })),
      identities: identities.map((p, index) => ({ id: index + 1, a: Math.min(...p), b: Math.max(...p) })),
    })),
)

function parts(size: number): GraphPart[] {
  return Array.from({ length: size }, (_, i) => ({ id: i + 1, partNumber: `P-${i + 1}`, kind: 'other' }))
}

const noDetails: FitDetails = { links: async () => new Map(), identities: async () => new Map() }

/** A graph as a fresh load builds it. */
function freshGraph(partList: GraphPart[], links: GraphLink[], identities: GraphIdentity[]): FitGraph {
  const graph = new FitGraph(noDetails)
  for (const part of partList) graph.setPart(part.id, part.partNumber, part.kind)
  for (const link of links) graph.setLink(link.id, link.a, link.b, link.relation, link.status)
  for (const identity of identities) graph.identities.add(identity.id, identity.a, identity.b)
  graph.settle()
  return graph
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
        const graph = freshGraph(parts(g.size), g.links, g.identities)
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

/** Each part's identity class, as the library's connected components over the identities alone. */
function identityComponents(g: RandomGraph): Map<number, Set<number>> {
  const identityGraph = cy(
    g,
    g.identities.map((i) => ({ id: `i${i.id}`, source: i.a, target: i.b, weight: 0 })),
  )
  const componentOf = new Map<number, Set<number>>()
  for (const component of identityGraph.elements().components()) {
    const ids = new Set(component.nodes().map((n) => Number(n.id())))
    for (const id of ids) componentOf.set(id, ids)
  }
  return componentOf
}

describe('reviewedFits against cytoscape connected components (identity classes)', () => {
  it('reaches exactly the parts identical to the other end of a non-rejected link of the part or of a part identical to it', () => {
    fc.assert(
      fc.property(graphArb, fc.integer({ min: 1, max: 18 }), (g, raw) => {
        const part = ((raw - 1) % g.size) + 1
        const graph = freshGraph(parts(g.size), g.links, g.identities)
        const componentOf = identityComponents(g)
        const own = componentOf.get(part)!
        const expected = new Set<number>()
        for (const link of g.links) {
          if (link.status === 'rejected') continue
          for (const [x, y] of [
            [link.a, link.b],
            [link.b, link.a],
          ] as const) {
            if (own.has(x) && !own.has(y)) for (const id of componentOf.get(y)!) expected.add(id)
          }
        }
        const found = reviewedFits(graph, part)
        expect([...found.keys()].sort((a, b) => a - b)).toEqual([...expected].sort((a, b) => a - b))
        for (const fit of found.values()) {
          // The deciding link joins the part's class to the target's class.
          expect(own.has(fit.member)).toBe(true)
          expect(componentOf.get(fit.target)!.has(fit.other)).toBe(true)
          const link = graph.linkAt(fit.slot)
          expect([link.a, link.b].sort()).toEqual([fit.member, fit.other].sort())
        }
      }),
      { numRuns: 300 },
    )
  })

  it('finds, for a set of parts, exactly the parts with an approved link to one of them or to a part identical to one', () => {
    fc.assert(
      fc.property(graphArb, fc.uniqueArray(fc.integer({ min: 1, max: 18 }), { maxLength: 3 }), (g, raw) => {
        const chosen = [...new Set(raw.map((r) => ((r - 1) % g.size) + 1))]
        const graph = freshGraph(parts(g.size), g.links, g.identities)
        const componentOf = identityComponents(g)
        const expected = new Set<number>()
        for (const link of g.links) {
          if (link.status !== 'approved') continue
          for (const [x, y] of [
            [link.a, link.b],
            [link.b, link.a],
          ] as const) {
            if (chosen.some((id) => componentOf.get(id)!.has(x))) for (const id of componentOf.get(y)!) expected.add(id)
          }
        }
        const sorted = (ids: Iterable<number>) => [...ids].sort((a, b) => a - b)
        expect(sorted(graph.linkedWith(chosen))).toEqual(sorted(expected))
      }),
      { numRuns: 300 },
    )
  })

  it('prefers an approved link over a proposed one for the same target', () => {
    const graph = freshGraph(
      parts(3),
      [
        { id: 1, a: 1, b: 2, relation: 'fits', status: 'proposed' },
        { id: 2, a: 1, b: 3, relation: 'does-not-fit', status: 'approved' },
      ],
      [{ id: 1, a: 2, b: 3 }],
    )
    const found = reviewedFits(graph, 1)
    expect(graph.linkAt(found.get(2)!.slot).id).toBe(2)
    expect(graph.linkAt(found.get(3)!.slot).id).toBe(2)
  })
})

/*
 * Deltas: a random sequence of edits (links added, changed, removed;
 * identities added and removed; parts removed) applied to a loaded graph one
 * at a time must leave it answering exactly as a graph loaded fresh from the
 * final rows.
 */
type Edit =
  | { type: 'set-link'; pair: [number, number]; relation: GraphLink['relation']; status: GraphLink['status'] }
  | { type: 'remove-link'; pick: number }
  | { type: 'set-identity'; pair: [number, number] }
  | { type: 'remove-identity'; pick: number }
  | { type: 'remove-part'; part: number }

const editArb = (size: number): fc.Arbitrary<Edit> =>
  fc.oneof(
    fc.record({
      type: fc.constant('set-link' as const),
      pair: pairArb(size),
      relation: fc.constantFrom('fits', 'fits-with-modification', 'does-not-fit' as const),
      status: fc.constantFrom('approved', 'proposed', 'rejected' as const),
    }),
    fc.record({ type: fc.constant('remove-link' as const), pick: fc.nat() }),
    fc.record({ type: fc.constant('set-identity' as const), pair: pairArb(size) }),
    fc.record({ type: fc.constant('remove-identity' as const), pick: fc.nat() }),
    fc.record({ type: fc.constant('remove-part' as const), part: fc.integer({ min: 1, max: size }) }),
  )

const scenarioArb = graphArb.chain((g) => fc.record({ g: fc.constant(g), edits: fc.array(editArb(g.size), { maxLength: 25 }) }))

/** The rows as the database would hold them after the edits (a pair holds one link or one identity; parts cascade). */
function applyToRows(g: RandomGraph, edits: Edit[], graph: FitGraph) {
  const partList = new Map(parts(g.size).map((p) => [p.id, p]))
  const links = new Map(g.links.map((l) => [l.id, { ...l }]))
  const identities = new Map(g.identities.map((i) => [i.id, { ...i }]))
  let nextId = 1000
  const key = (a: number, b: number) => `${Math.min(a, b)}-${Math.max(a, b)}`
  for (const edit of edits) {
    if (edit.type === 'set-link') {
      const [a, b] = [Math.min(...edit.pair), Math.max(...edit.pair)]
      if (!partList.has(a) || !partList.has(b) || [...identities.values()].some((i) => key(i.a, i.b) === key(a, b))) continue
      const existing = [...links.values()].find((l) => key(l.a, l.b) === key(a, b))
      const link = { id: existing?.id ?? nextId++, a, b, relation: edit.relation, status: edit.status }
      links.set(link.id, link)
      graph.setLink(link.id, a, b, link.relation, link.status)
    } else if (edit.type === 'remove-link') {
      const ids = [...links.keys()]
      if (ids.length === 0) continue
      const id = ids[edit.pick % ids.length]!
      links.delete(id)
      graph.removeLink(id)
    } else if (edit.type === 'set-identity') {
      const [a, b] = [Math.min(...edit.pair), Math.max(...edit.pair)]
      if (!partList.has(a) || !partList.has(b)) continue
      if ([...links.values(), ...identities.values()].some((row) => key(row.a, row.b) === key(a, b))) continue
      const id = nextId++
      identities.set(id, { id, a, b })
      graph.setIdentity(id, a, b)
    } else if (edit.type === 'remove-identity') {
      const ids = [...identities.keys()]
      if (ids.length === 0) continue
      const id = ids[edit.pick % ids.length]!
      identities.delete(id)
      graph.removeIdentity(id)
    } else {
      if (!partList.has(edit.part)) continue
      partList.delete(edit.part)
      for (const [id, l] of links) if (l.a === edit.part || l.b === edit.part) links.delete(id)
      for (const [id, i] of identities) if (i.a === edit.part || i.b === edit.part) identities.delete(id)
      graph.removePart(edit.part)
    }
  }
  return { partList: [...partList.values()], links: [...links.values()], identities: [...identities.values()] }
}

const linkCount = (steps: ReturnType<typeof shortestFitPath>) => (steps === null ? null : steps.filter((s) => s.type === 'link').length)

describe('the graph after deltas against a fresh load of the same rows', () => {
  it('gives the same classes, reviewed fits, path lengths, neighbourhoods and decisive links', () => {
    fc.assert(
      fc.property(scenarioArb, ({ g, edits }) => {
        const edited = freshGraph(parts(g.size), g.links, g.identities)
        const rows = applyToRows(g, edits, edited)
        const fresh = freshGraph(rows.partList, rows.links, rows.identities)
        expect(edited.partCount).toBe(fresh.partCount)
        expect(edited.links.size).toBe(fresh.links.size)
        for (const { id } of rows.partList) {
          expect(edited.classOf(id)).toEqual(fresh.classOf(id))
          const fits = (graph: FitGraph) =>
            [...reviewedFits(graph, id).values()]
              .map((fit) => [fit.target, graph.linkAt(fit.slot).id, fit.cost])
              .sort((x, y) => x[0]! - y[0]!)
          expect(fits(edited)).toEqual(fits(fresh))
          const around = (graph: FitGraph) => [...neighbourhoodOf(graph, id, 2, 1000, 1000).distance].sort((x, y) => x[0] - y[0])
          expect(around(edited)).toEqual(around(fresh))
          for (const { id: other } of rows.partList) {
            expect(linkCount(shortestFitPath(edited, id, other))).toBe(linkCount(shortestFitPath(fresh, id, other)))
            expect(edited.linkBetween(id, other, ['approved', 'proposed'])?.link.id).toBe(
              fresh.linkBetween(id, other, ['approved', 'proposed'])?.link.id,
            )
          }
        }
      }),
      { numRuns: 150 },
    )
  })
})
