import { APPROVED, DOES_NOT_FIT, type FitGraph } from './graph/fit-graph'

export type SubstituteCaps = { counterparts: number; linksPerCounterpart: number }
export type FoundSubstitute = { id: number; shared: number[] }

/** Bounds for a hub part (a gasket every head fits): the answer then weighs the first mating parts only. */
export const SUBSTITUTE_CAPS: SubstituteCaps = { counterparts: 200, linksPerCounterpart: 2000 }

/**
 * Parts of the same kind that fit the same mating parts (approved fits, with
 * or without modification), ranked by how many they share, then by number.
 * Identical numbers of the part are the part, not substitutes; the links of a
 * mating part's identical numbers count as its own.
 */
export function findSubstitutes(graph: FitGraph, partId: number, caps: SubstituteCaps = SUBSTITUTE_CAPS) {
  const { links } = graph
  const kind = graph.kindOf(partId)
  const members = new Set(graph.classOf(partId))
  let capped = false
  const fitsAt = (id: number, limit: number, visit: (other: number) => void) => {
    const slots = links.slotsAt(id)
    const degree = links.degreeOf(id)
    if (degree > limit) capped = true
    for (let i = 0, n = Math.min(degree, limit); i < n; i++) {
      const slot = slots[i]!
      if (links.status[slot] === APPROVED && links.relation[slot] !== DOES_NOT_FIT) visit(links.other(slot, id))
    }
  }
  const counterparts = new Set<number>()
  for (const member of members) {
    fitsAt(member, caps.linksPerCounterpart, (other) => {
      if (members.has(other)) return
      if (counterparts.size >= caps.counterparts) capped = true
      else counterparts.add(other)
    })
  }
  const shared = new Map<number, Set<number>>()
  for (const counterpart of counterparts) {
    for (const id of graph.classOf(counterpart)) {
      fitsAt(id, caps.linksPerCounterpart, (other) => {
        if (members.has(other) || graph.kindOf(other) !== kind) return
        let set = shared.get(other)
        if (!set) shared.set(other, (set = new Set()))
        set.add(counterpart)
      })
    }
  }
  const found: FoundSubstitute[] = [...shared].map(([id, set]) => ({ id, shared: [...set] }))
  found.sort((a, b) => b.shared.length - a.shared.length || graph.partNumberOf(a.id).localeCompare(graph.partNumberOf(b.id)))
  return { found, capped }
}
