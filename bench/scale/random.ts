/** A seeded generator (mulberry32), so every run builds the same catalogue. */
export type Random = {
  next: () => number
  int: (below: number) => number
  pick: <T>(values: readonly T[]) => T
}

export function seededRandom(seed: number): Random {
  let state = seed >>> 0
  const next = () => {
    state = (state + 0x6d2b79f5) >>> 0
    let t = state
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
  const int = (below: number) => Math.floor(next() * below)
  return { next, int, pick: (values) => values[int(values.length)]! }
}

/**
 * Ranks 0..size-1 drawn with probability proportional to 1 / (rank + 1)^exponent.
 * An exponent of 0.8 gives the top rank a few per cent of all draws: a belt
 * or gasket with thousands of links, and a long tail of parts with a handful.
 */
export function zipfSampler(size: number, exponent: number, random: Random): () => number {
  const cumulative = new Float64Array(size)
  let total = 0
  for (let rank = 0; rank < size; rank++) {
    total += 1 / Math.pow(rank + 1, exponent)
    cumulative[rank] = total
  }
  return () => {
    const target = random.next() * total
    let low = 0
    let high = size - 1
    while (low < high) {
      const middle = (low + high) >>> 1
      if (cumulative[middle]! < target) low = middle + 1
      else high = middle
    }
    return low
  }
}
