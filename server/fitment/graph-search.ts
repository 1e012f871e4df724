import { APPROVED, REJECTED, type FitGraph, type GraphIdentity, type GraphLink } from './graph/fit-graph'

export type PathStep = { from: number; to: number } & ({ type: 'identity'; identity: GraphIdentity } | { type: 'link'; link: GraphLink })

/** Links that carry a path: approved, and a fit (with or without modification). */
export function isFitLink(link: Pick<GraphLink, 'status' | 'relation'>): boolean {
  return link.status === 'approved' && link.relation !== 'does-not-fit'
}

/** Per-graph work arrays, reused by every search (searches run to the end without awaiting). */
type Buffers = { stamp: Uint32Array; via: Int32Array; previous: Int32Array; queue: Int32Array; round: number }
const buffers = new WeakMap<FitGraph, Buffers>()

function buffersFor(graph: FitGraph): Buffers {
  const size = graph.partCapacity + 1
  let found = buffers.get(graph)
  if (!found || found.stamp.length < size || found.round >= 0xffffffff) {
    const capacity = Math.max(size, Math.ceil((found?.stamp.length ?? 0) * 1.5))
    found = {
      stamp: new Uint32Array(capacity),
      via: new Int32Array(capacity),
      previous: new Int32Array(capacity),
      queue: new Int32Array(capacity),
      round: 0,
    }
    buffers.set(graph, found)
  }
  found.round++
  return found
}

/** `via` for a part reached through identities from `previous`: its chain is read back by identityChain. */
const BY_IDENTITY = 0

/**
 * Shortest chain of fit links between two parts, by breadth-first search over
 * the graph's path lists (approved fit links only). Identical parts are one
 * part: reaching one reaches its whole class at the same distance, so identity
 * steps cost nothing. Stops when the target is reached. Returns the steps in
 * order, or null when no chain exists.
 */
export function shortestFitPath(graph: FitGraph, from: number, to: number): PathStep[] | null {
  const { stamp, via, previous, queue, round } = buffersFor(graph)
  const { links, identities } = graph
  const paths = links.paths
  const entries = paths.entries
  let tail = 0
  // Marks a part reached (and its identical parts with it); answers whether that reached the target.
  const reach = (part: number, step: number, back: number): boolean => {
    stamp[part] = round
    via[part] = step
    previous[part] = back
    queue[tail++] = part
    if (part === to) return true
    if (identities.degreeOf(part) === 0) return false
    for (const member of graph.classOf(part)) {
      if (stamp[member] === round) continue
      stamp[member] = round
      via[member] = BY_IDENTITY
      previous[member] = part
      queue[tail++] = member
      if (member === to) return true
    }
    return false
  }
  let found = reach(from, BY_IDENTITY, from)
  for (let head = 0; head < tail && !found; head++) {
    const current = queue[head]!
    for (let at = paths.runOf(current), end = at + 2 * paths.degreeOf(current); at < end; at += 2) {
      const next = entries[at]!
      if (stamp[next] === round) continue
      // Links are kept as their slot + 1, so BY_IDENTITY (0) stays apart.
      if (reach(next, entries[at + 1]! + 1, current)) {
        found = true
        break
      }
    }
  }
  if (!found) return null
  const steps: PathStep[] = []
  for (let node = to; node !== from;) {
    const step = via[node]!
    const back = previous[node]!
    if (step === BY_IDENTITY) {
      let at = node
      for (const identity of graph.identityChain(back, node).reverse()) {
        const before = identity.a === at ? identity.b : identity.a
        steps.push({ type: 'identity', identity, from: before, to: at })
        at = before
      }
    } else steps.push({ type: 'link', link: graph.linkAt(step - 1), from: back, to: node })
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
