import { APPROVED, DOES_NOT_FIT, REJECTED, type FitGraph, type GraphIdentity, type GraphLink } from './graph/fit-graph'

export type PathStep = { from: number; to: number } & ({ type: 'identity'; identity: GraphIdentity } | { type: 'link'; link: GraphLink })

/** Links that carry a path: approved, and a fit (with or without modification). */
export function isFitLink(link: Pick<GraphLink, 'status' | 'relation'>): boolean {
  return link.status === 'approved' && link.relation !== 'does-not-fit'
}

/** Per-graph work arrays, reused by every search (searches run to the end without awaiting). */
type Buffers = {
  stamp: Uint32Array
  closed: Uint32Array
  distance: Int32Array
  via: Int32Array
  previous: Int32Array
  queue: Int32Array
  round: number
}
const buffers = new WeakMap<FitGraph, Buffers>()

function buffersFor(graph: FitGraph): Buffers {
  const size = graph.partCapacity + 1
  let found = buffers.get(graph)
  if (!found || found.stamp.length < size || found.round >= 0xffffffff) {
    const capacity = Math.max(size, Math.ceil((found?.stamp.length ?? 0) * 1.5))
    found = {
      stamp: new Uint32Array(capacity),
      closed: new Uint32Array(capacity),
      distance: new Int32Array(capacity),
      via: new Int32Array(capacity),
      previous: new Int32Array(capacity),
      queue: new Int32Array(capacity * 2 + 2),
      round: 0,
    }
    buffers.set(graph, found)
  }
  found.round++
  return found
}

/**
 * Shortest chain of fit links between two parts by 0-1 breadth-first search
 * over the graph's typed arrays: identity steps cost nothing (identical parts
 * are one part), fit links cost one. Stops when the target leaves the queue.
 * Returns the steps in order, or null when no chain exists.
 */
export function shortestFitPath(graph: FitGraph, from: number, to: number): PathStep[] | null {
  const { stamp, closed, distance, via, previous, queue, round } = buffersFor(graph)
  const { links, identities } = graph
  // Each part enters the deque at most twice (0-1 BFS), so twice the parts is room enough.
  const size = queue.length
  let head = 0
  let tail = 0
  const reach = (part: number, cost: number, step: number, from: number, front: boolean): void => {
    if (stamp[part] === round && distance[part]! <= cost) return
    stamp[part] = round
    distance[part] = cost
    via[part] = step
    previous[part] = from
    if (front) {
      head = (head - 1 + size) % size
      queue[head] = part
    } else {
      queue[tail] = part
      tail = (tail + 1) % size
    }
  }
  reach(from, 0, 0, from, false)
  let found = false
  while (head !== tail) {
    const current = queue[head]!
    head = (head + 1) % size
    // A part can sit in the deque twice; the second time it has nothing new to give.
    if (closed[current] === round) continue
    closed[current] = round
    if (current === to) {
      found = true
      break
    }
    const base = distance[current]!
    const identitySlots = identities.slotsAt(current)
    for (let i = 0, n = identities.degreeOf(current); i < n; i++) {
      const slot = identitySlots[i]!
      // Identity steps are kept as negative numbers, links as their slot + 1.
      reach(identities.other(slot, current), base, -(slot + 1), current, true)
    }
    const linkSlots = links.slotsAt(current)
    for (let i = 0, n = links.degreeOf(current); i < n; i++) {
      const slot = linkSlots[i]!
      if (links.status[slot] !== APPROVED || links.relation[slot] === DOES_NOT_FIT) continue
      reach(links.other(slot, current), base + 1, slot + 1, current, false)
    }
  }
  if (!found) return null
  const steps: PathStep[] = []
  for (let node = to; node !== from;) {
    const step = via[node]!
    const back = previous[node]!
    steps.push(
      step < 0
        ? { type: 'identity', identity: graph.identityAt(-step - 1), from: back, to: node }
        : { type: 'link', link: graph.linkAt(step - 1), from: back, to: node },
    )
    node = back
  }
  return steps.reverse()
}

export type ReviewedFit = { target: number; slot: number; member: number; other: number; cost: number }

/**
 * Every part a part fits (or is judged not to fit) through reviewed links: the
 * links of the part and of every identical part, carried over to every part
 * identical to the other end. Rejected links do not count; per target the
 * most direct approved derivation wins.
 */
export function reviewedFits(graph: FitGraph, partId: number): Map<number, ReviewedFit> {
  const members = graph.classOf(partId)
  const inClass = (id: number) => (members.length === 1 ? id === partId : members.includes(id))
  const { links } = graph
  const found = new Map<number, ReviewedFit>()
  for (const member of members) {
    const slots = links.slotsAt(member)
    for (let i = 0, n = links.degreeOf(member); i < n; i++) {
      const slot = slots[i]!
      const status = links.status[slot]!
      if (status === REJECTED) continue
      const other = links.other(slot, member)
      if (inClass(other)) continue
      for (const target of graph.classOf(other)) {
        const cost = (member === partId ? 0 : 1) + (target === other ? 0 : 1) + (status === APPROVED ? 0 : 10)
        const existing = found.get(target)
        if (existing && (existing.cost < cost || (existing.cost === cost && links.id[existing.slot]! <= links.id[slot]!))) continue
        found.set(target, { target, slot, member, other, cost })
      }
    }
  }
  return found
}

export type NeighbourhoodFound = { distance: Map<number, number>; linkSlots: number[]; identitySlots: number[]; capped: boolean }

/**
 * Parts within `depth` identities or non-rejected links of a part, then the
 * links and identities among them, stopping as soon as either cap is reached.
 */
export function neighbourhoodOf(graph: FitGraph, centre: number, depth: number, maxNodes: number, maxEdges: number): NeighbourhoodFound {
  const { links, identities } = graph
  const distance = new Map<number, number>([[centre, 0]])
  let frontier = [centre]
  let capped = false
  const visit = (next: number[], neighbour: number, level: number): boolean => {
    if (distance.has(neighbour)) return true
    if (distance.size >= maxNodes) return false
    distance.set(neighbour, level)
    next.push(neighbour)
    return true
  }
  for (let level = 1; level <= depth && !capped; level++) {
    const next: number[] = []
    for (const id of frontier) {
      const identitySlots = identities.slotsAt(id)
      for (let i = 0, n = identities.degreeOf(id); i < n && !capped; i++)
        capped = !visit(next, identities.other(identitySlots[i]!, id), level)
      const linkSlots = links.slotsAt(id)
      for (let i = 0, n = links.degreeOf(id); i < n && !capped; i++) {
        const slot = linkSlots[i]!
        if (links.status[slot] !== REJECTED) capped = !visit(next, links.other(slot, id), level)
      }
      if (capped) break
    }
    frontier = next
  }
  const linkSlots: number[] = []
  const identitySlots: number[] = []
  const taken = new Set<number>()
  // Identities and links share one numbering here: identities negative.
  const take = (key: number, into: number[], slot: number): boolean => {
    if (taken.has(key)) return true
    if (taken.size >= maxEdges) return false
    taken.add(key)
    into.push(slot)
    return true
  }
  outer: for (const id of distance.keys()) {
    const slots = identities.slotsAt(id)
    for (let i = 0, n = identities.degreeOf(id); i < n; i++) {
      const slot = slots[i]!
      if (distance.has(identities.other(slot, id)) && !take(-(slot + 1), identitySlots, slot)) {
        capped = true
        break outer
      }
    }
    const own = links.slotsAt(id)
    for (let i = 0, n = links.degreeOf(id); i < n; i++) {
      const slot = own[i]!
      if (links.status[slot] !== REJECTED && distance.has(links.other(slot, id)) && !take(slot + 1, linkSlots, slot)) {
        capped = true
        break outer
      }
    }
  }
  return { distance, linkSlots, identitySlots, capped }
}
