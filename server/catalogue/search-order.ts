import type { PartKind } from '../../shared/schemas/part-kinds'

/** What ordering search hits needs of every part, held in memory (the fit graph holds it). */
export interface PartDirectory {
  hasPart(id: number): boolean
  partNumberOf(id: number): string
  kindOf(id: number): PartKind
}

/** Parts a search found, best tier first (exact number or mark, then prefix, then words); a part may sit in several. */
export type SearchTiers = number[][]

/**
 * One page of search hits and their total: each part once, in its best tier,
 * tiers in order and part-number order (byte order) within a tier, of the kind
 * asked for. Only the parts up to the page's end are ordered, so a word that
 * ten thousand parts share costs a pass over them, not a sort.
 */
export function pageOfHits(
  tiers: SearchTiers,
  directory: PartDirectory,
  page: { kind?: PartKind; offset: number; limit: number },
): { ids: number[]; total: number } {
  const seen = new Set<number>()
  const ids: number[] = []
  let total = 0
  for (const tier of tiers) {
    const members: number[] = []
    for (const id of tier) {
      if (seen.has(id) || !directory.hasPart(id)) continue
      seen.add(id)
      if (!page.kind || directory.kindOf(id) === page.kind) members.push(id)
    }
    const wanted = page.offset + page.limit - total
    if (wanted > 0) ids.push(...firstByNumber(members, wanted, directory))
    total += members.length
  }
  return { ids: ids.slice(page.offset, page.offset + page.limit), total }
}

/** The `count` parts with the lowest numbers, in order: a bounded insertion, cheap when count is a page. */
function firstByNumber(ids: number[], count: number, directory: PartDirectory): number[] {
  const byNumber = (a: number, b: number) => compare(directory.partNumberOf(a), directory.partNumberOf(b))
  if (ids.length <= count * 4) return ids.sort(byNumber).slice(0, count)
  const best: number[] = []
  for (const id of ids) {
    if (best.length === count && byNumber(id, best[count - 1]!) >= 0) continue
    let low = 0
    let high = best.length
    while (low < high) {
      const middle = (low + high) >> 1
      if (byNumber(best[middle]!, id) <= 0) low = middle + 1
      else high = middle
    }
    best.splice(low, 0, id)
    if (best.length > count) best.pop()
  }
  return best
}

function compare(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0
}
