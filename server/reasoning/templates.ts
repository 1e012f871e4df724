/** Paths come from the rule files, a few hundred in all, and are read for every judgement. */
const stepsByPath = new Map<string, string[]>()

function stepsOf(path: string): string[] {
  let steps = stepsByPath.get(path)
  if (!steps) {
    steps = path
      .replace(/^\$\.?/, '')
      .split('.')
      .filter(Boolean)
    if (stepsByPath.size < 10_000) stepsByPath.set(path, steps)
  }
  return steps
}

/** Reads `$.a.b` (or `a.b`) from an object; undefined when any step is missing. */
export function resolvePath(value: unknown, path: string): unknown {
  const steps = stepsOf(path)
  let current: unknown = value
  for (const step of steps) {
    if (current === null || typeof current !== 'object') return undefined
    current = (current as Record<string, unknown>)[step]
  }
  return current
}

function formatValue(value: unknown): string {
  if (typeof value === 'number') return String(Math.round(value * 100) / 100)
  return String(value)
}

/** Fills `{{fact.path}}` placeholders from the facts; a missing value reads as "?". */
export function renderTemplate(text: string, facts: Record<string, unknown>): string {
  return text.replace(/\{\{\s*([A-Za-z0-9_-]+)((?:\.[A-Za-z0-9_-]+)*)\s*\}\}/g, (_, fact: string, path: string) => {
    const value = resolvePath(facts[fact], path)
    return value === undefined || value === null ? '?' : formatValue(value)
  })
}

/** The fact paths a template reads, as `fact` + `$.path` pairs. */
export function templateReferences(text: string): { fact: string; path: string }[] {
  return [...text.matchAll(/\{\{\s*([A-Za-z0-9_-]+)((?:\.[A-Za-z0-9_-]+)*)\s*\}\}/g)].map((match) => ({
    fact: match[1]!,
    path: `$${match[2] ?? ''}`,
  }))
}
