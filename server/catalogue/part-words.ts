/**
 * The words search finds a part by: its name and family split at anything
 * that is not a letter or digit, lower case, accents dropped. The same split
 * serves the query, so "Timing belt" finds "timing-belt kit".
 */
export function wordsOf(...texts: string[]): string[] {
  const words = new Set<string>()
  for (const text of texts) {
    for (const word of text
      .normalize('NFKD')
      .replace(/[\u0300-\u036f]/g, '')
      .toLowerCase()
      .split(/[^a-z0-9]+/)) {
      if (word) words.add(word)
    }
  }
  return [...words]
}

/** The first string after every string starting with `prefix`: a prefix is then the range [prefix, next). */
export function afterPrefix(prefix: string): string {
  const last = prefix.codePointAt(prefix.length - 1)!
  return prefix.slice(0, -1) + String.fromCodePoint(last + 1)
}
