/**
 * Levenshtein distance (single-character insertions, deletions and
 * substitutions), with an optional bound: once every cell of a row exceeds
 * `max` the answer is `max + 1`, so checking a candidate against "a character
 * or two" stops early instead of filling the whole table.
 */
export function editDistance(a: string, b: string, max = Number.POSITIVE_INFINITY): number {
  if (Math.abs(a.length - b.length) > max) return max + 1
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j)
  for (let i = 1; i <= a.length; i++) {
    const current = [i]
    let best = i
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1
      const value = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + cost)
      current.push(value)
      if (value < best) best = value
    }
    if (best > max) return max + 1
    previous = current
  }
  return Math.min(previous[b.length]!, max + 1)
}
