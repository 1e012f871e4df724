import type { RuleInput } from '../fitment/graph/attribute-classes'

/** What a candidate brings to a judgement: its number and what the rules and figures read of it. */
export type CandidateInput = RuleInput & { partNumber: string }

/** Names of the candidate's values besides its attributes, as the read sets record them. */
const YEAR_TO = '\u0000yearTo'
const PART_NUMBER = '\u0000partNumber'
/** A read of every attribute at once (keys listed, object spread or copied): the whole class decides. */
const EVERYTHING = '\u0000*'
const MISSING = '\u0000missing'
/** Beyond this many read sets a slot's candidates are judged one by one rather than compared with each set. */
const MAX_SHAPES = 4
/** After this many judgements, a cache that answered fewer than one in ten stops looking (its lookups cost more than they save). */
const TRIAL = 200

type Shape = { names: string[]; answers: Map<string, unknown> }

/**
 * A candidate part behind Proxies that note what is read of it: each
 * attribute by name (also names it does not have), the last year, and, through
 * `trackNumber`, its number where the facts hold it.
 */
export class CandidateReads {
  readonly names = new Set<string>()
  readonly part: { partNumber: string; attributes: RuleInput['attributes']; readonly yearTo: number | null }

  constructor(input: CandidateInput) {
    const names = this.names
    const attributes = new Proxy(input.attributes, {
      get(target, name, receiver) {
        if (typeof name === 'string') names.add(name)
        return Reflect.get(target, name, receiver) as unknown
      },
      has(target, name) {
        if (typeof name === 'string') names.add(name)
        return Reflect.has(target, name)
      },
      ownKeys(target) {
        names.add(EVERYTHING)
        return Reflect.ownKeys(target)
      },
      getOwnPropertyDescriptor(target, name) {
        names.add(EVERYTHING)
        return Reflect.getOwnPropertyDescriptor(target, name)
      },
    })
    // The number is not tracked here: building the facts reads it only to put it under `slots`, tracked there.
    this.part = {
      partNumber: input.partNumber,
      attributes,
      get yearTo() {
        names.add(YEAR_TO)
        return input.yearTo
      },
    }
  }

  /** The facts' slot-to-number table, noting a read of the candidate's slot. */
  trackNumber<T extends object>(numbers: T, slot: string): T {
    const names = this.names
    return new Proxy(numbers, {
      get(target, name, receiver) {
        if (name === slot) names.add(PART_NUMBER)
        return Reflect.get(target, name, receiver) as unknown
      },
      ownKeys(target) {
        names.add(PART_NUMBER)
        return Reflect.ownKeys(target)
      },
    })
  }
}

function valueOf(input: CandidateInput, name: string): unknown {
  if (name === YEAR_TO) return input.yearTo
  if (name === PART_NUMBER) return input.partNumber
  if (name === EVERYTHING) return input.attributes
  return Object.hasOwn(input.attributes, name) ? input.attributes[name] : MISSING
}

/**
 * Judgements of one slot's candidates for one build, shared between
 * candidates that agree on every value a judgement read. The first candidate
 * of a kind is judged through CandidateReads; a later one reuses that answer
 * when its values for the names read are the same. Sound because a judgement
 * is a function of what it reads: equal reads take the same path through the
 * figures, the facts and the rules, so they read nothing else and answer the
 * same. Most candidates differ in attributes no rule of their pairs reads.
 */
export class JudgementCache<T> {
  private readonly shapes = new Map<string, Shape>()
  private hits = 0
  private misses = 0

  /** `run` judges the part it is given; with `reads`, that part notes what is read of it. */
  async judge(input: CandidateInput, run: (part: CandidateReads['part'], reads?: CandidateReads) => Promise<T>): Promise<T> {
    if (this.misses >= TRIAL && this.hits * 10 < this.misses) return run(input)
    for (const shape of this.shapes.values()) {
      const key = keyOf(input, shape.names)
      if (shape.answers.has(key)) {
        this.hits++
        return shape.answers.get(key) as T
      }
    }
    this.misses++
    const reads = new CandidateReads(input)
    const answer = await run(reads.part, reads)
    const names = [...reads.names].sort()
    const id = names.join('\u0001')
    let shape = this.shapes.get(id)
    if (!shape && this.shapes.size < MAX_SHAPES) {
      shape = { names, answers: new Map() }
      this.shapes.set(id, shape)
    }
    shape?.answers.set(keyOf(input, names), answer)
    return answer
  }
}

function keyOf(input: CandidateInput, names: string[]): string {
  let key = ''
  for (const name of names) {
    const value = valueOf(input, name)
    key += (typeof value === 'object' || typeof value === 'string' ? JSON.stringify(value) : `${typeof value}:${String(value)}`) + '\u0001'
  }
  return key
}
