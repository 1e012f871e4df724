import type { FitGraph, GraphIdentity, GraphLink } from './fit-graph'

export type PathStep = { from: number; to: number } & ({ type: 'identity'; identity: GraphIdentity } | { type: 'link'; link: GraphLink })

/** Links that carry a path: approved, and a fit (with or without modification). */
export function isFitLink(link: GraphLink): boolean {
  return link.status === 'approved' && link.relation !== 'does-not-fit'
}

/**
 * Shortest chain of fit links between two parts by 0-1 breadth-first search:
 * identity steps cost nothing (identical parts are one part), fit links cost one.
 * Returns the steps in order, or null when no chain exists.
 */
export function shortestFitPath(graph: FitGraph, from: number, to: number): PathStep[] | null {
  const distance = new Map<number, number>([[from, 0]])
  const previous = new Map<number, PathStep>()
  const queue: number[] = [from]
  while (queue.length) {
    const current = queue.shift()!
    if (current === to) break
    const base = distance.get(current)!
    const relax = (step: PathStep, weight: 0 | 1) => {
      if (base + weight >= (distance.get(step.to) ?? Infinity)) return
      distance.set(step.to, base + weight)
      previous.set(step.to, step)
      if (weight === 0) queue.unshift(step.to)
      else queue.push(step.to)
    }
    for (const identity of graph.identitiesOf(current)) {
      relax({ type: 'identity', identity, from: current, to: identity.a === current ? identity.b : identity.a }, 0)
    }
    for (const link of graph.linksOf(current)) {
      if (isFitLink(link)) relax({ type: 'link', link, from: current, to: link.a === current ? link.b : link.a }, 1)
    }
  }
  if (!distance.has(to)) return null
  const steps: PathStep[] = []
  for (let node = to; node !== from; ) {
    const step = previous.get(node)!
    steps.unshift(step)
    node = step.from
  }
  return steps
}

export type ReviewedFit = { target: number; link: GraphLink; member: number; other: number; cost: number }

/**
 * Every part a part fits (or is judged not to fit) through reviewed links: the
 * links of the part and of every identical part, carried over to every part
 * identical to the other end. Rejected links do not count; per target the
 * most direct approved derivation wins.
 */
export function reviewedFits(graph: FitGraph, partId: number): Map<number, ReviewedFit> {
  const members = new Set(graph.classOf(partId))
  const found = new Map<number, ReviewedFit>()
  for (const member of members) {
    for (const link of graph.linksOf(member)) {
      if (link.status === 'rejected') continue
      const other = link.a === member ? link.b : link.a
      if (members.has(other)) continue
      for (const target of graph.classOf(other)) {
        const cost = (member === partId ? 0 : 1) + (target === other ? 0 : 1) + (link.status === 'approved' ? 0 : 10)
        const existing = found.get(target)
        if (existing && (existing.cost < cost || (existing.cost === cost && existing.link.id <= link.id))) continue
        found.set(target, { target, link, member, other, cost })
      }
    }
  }
  return found
}
