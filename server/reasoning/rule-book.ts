import { Engine, type RuleProperties } from 'json-rules-engine'
import { pairKey } from '../../shared/build-template'
import { pushTo } from '../lib/map-list'
import { addOperators } from './operators'
import type { Condition, RuleEvent, RuleFile } from './rule-file.schema'
import type { LoadedRules } from './rule-loader'
import { renderTemplate, resolvePath, templateReferences } from './templates'

export type Facts = Record<string, unknown>

/** A rule that fired, with its texts filled in from the facts. */
/** `measured`: from a file that judges the engine's measured condition (see the rule-file schema). */
export type RuleOutcome = { ruleId: string; ruleName: string; ruleTitle: string; event: RuleEvent; measured?: boolean }

type CompiledEngine = { engine: Engine; reads: { fact: string; path: string }[] }

const CACHE_LIMIT = 50_000
const NO_OUTCOMES: RuleOutcome[] = Object.freeze([]) as unknown as RuleOutcome[]

function conditionReads(condition: Condition, into: { fact: string; path: string }[]) {
  if ('all' in condition) condition.all.forEach((c) => conditionReads(c, into))
  else if ('any' in condition) condition.any.forEach((c) => conditionReads(c, into))
  else if ('not' in condition) conditionReads(condition.not, into)
  else {
    into.push({ fact: condition.fact, path: condition.path ?? '$' })
    const value = condition.value as { fact?: string; path?: string }
    if (value && typeof value === 'object' && value.fact) into.push({ fact: value.fact, path: value.path ?? '$' })
  }
}

function eventReads(event: RuleEvent): { fact: string; path: string }[] {
  const texts: string[] = []
  const collect = (value: unknown) => {
    if (typeof value === 'string') texts.push(value)
    else if (Array.isArray(value)) value.forEach(collect)
    else if (value && typeof value === 'object') Object.values(value).forEach(collect)
  }
  collect(event.params)
  return texts.flatMap(templateReferences)
}

function renderEvent(event: RuleEvent, facts: Facts): RuleEvent {
  const render = (value: unknown): unknown => {
    if (typeof value === 'string') return renderTemplate(value, facts)
    if (Array.isArray(value)) return value.map(render)
    if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, render(v)]))
    return value
  }
  return { type: event.type, params: render(event.params) } as RuleEvent
}

/**
 * The shipped rules, compiled once into one json-rules-engine engine per
 * mating pair and one for whole-build rules, and reused for every answer.
 */
export class RuleBook {
  private readonly pairEngines = new Map<string, CompiledEngine>()
  private readonly buildEngine: CompiledEngine
  private readonly ruleInfo = new Map<string, { id: string; title: string; event: RuleEvent; measured: boolean }>()
  private readonly cache = new Map<string, RuleOutcome[]>()

  constructor(readonly loaded: LoadedRules) {
    const grouped = new Map<string, { file: RuleFile; rule: RuleFile['rules'][number] }[]>()
    for (const file of loaded.files) {
      for (const rule of file.rules) {
        const pair = rule.pair ?? file.pair
        const key = file.scope === 'build' || !pair ? 'build' : pairKey(pair[0], pair[1])
        pushTo(grouped, key, { file, rule })
      }
    }
    for (const [key, rules] of grouped) {
      if (key !== 'build') this.pairEngines.set(key, this.compile(rules))
    }
    this.buildEngine = this.compile(grouped.get('build') ?? [])
  }

  private compile(rules: { file: RuleFile; rule: RuleFile['rules'][number] }[]): CompiledEngine {
    const engine = new Engine([], {
      allowUndefinedFacts: true,
      pathResolver: (value: object, path: string) => resolvePath(value, path),
    })
    addOperators(engine)
    const reads: { fact: string; path: string }[] = []
    for (const { file, rule } of rules) {
      const name = `${file.id}/${rule.name}`
      this.ruleInfo.set(name, { id: file.id, title: file.title, event: rule.event, measured: file.measured === true })
      engine.addRule({
        name,
        priority: rule.priority ?? 1,
        conditions: rule.conditions as RuleProperties['conditions'],
        event: { type: rule.event.type, params: { rule: name } },
      })
      conditionReads(rule.conditions, reads)
      reads.push(...eventReads(rule.event))
    }
    const unique = [...new Map(reads.map((read) => [`${read.fact}${read.path}`, read])).values()]
    return { engine, reads: unique }
  }

  get files(): RuleFile[] {
    return this.loaded.files
  }

  /** The loaded rule files as the API lists them. */
  summaries() {
    return this.loaded.files.map((file) => ({
      id: file.id,
      title: file.title,
      description: file.description,
      source: file.source,
      scope: file.scope,
      rules: file.rules.map((rule) => ({ name: rule.name, pair: rule.pair ?? file.pair ?? null, event: rule.event.type })),
    }))
  }

  hasPairRules(kindA: string, kindB: string): boolean {
    return this.pairEngines.has(pairKey(kindA, kindB))
  }

  /** Rules for one mating pair; answers are cached by the values the rules read. */
  async evaluatePair(kindA: string, kindB: string, facts: Facts): Promise<RuleOutcome[]> {
    return this.pairOutcomes(kindA, kindB, facts)
  }

  /**
   * The same, answered without a promise when the rules have judged these
   * values before (thousands of candidates in a request share a few answers):
   * an array then, a promise only when the rules must run.
   */
  pairOutcomes(kindA: string, kindB: string, facts: Facts): RuleOutcome[] | Promise<RuleOutcome[]> {
    const compiled = this.pairEngines.get(pairKey(kindA, kindB))
    if (!compiled) return NO_OUTCOMES
    const key = this.keyOf(pairKey(kindA, kindB), compiled, facts)
    return this.cache.get(key) ?? this.runKeyed(key, compiled, facts)
  }

  async evaluateBuild(facts: Facts): Promise<RuleOutcome[]> {
    return this.run('build', this.buildEngine, facts)
  }

  private keyOf(scope: string, compiled: CompiledEngine, facts: Facts): string {
    return scope + JSON.stringify(compiled.reads.map((read) => resolvePath(facts[read.fact], read.path) ?? null))
  }

  private async run(scope: string, compiled: CompiledEngine, facts: Facts): Promise<RuleOutcome[]> {
    const key = this.keyOf(scope, compiled, facts)
    return this.cache.get(key) ?? this.runKeyed(key, compiled, facts)
  }

  private async runKeyed(key: string, compiled: CompiledEngine, facts: Facts): Promise<RuleOutcome[]> {
    const { results } = await compiled.engine.run(facts)
    const outcomes = results
      .map((result) => {
        const info = this.ruleInfo.get(result.name as string)!
        return {
          ruleId: info.id,
          ruleName: (result.name as string).slice(info.id.length + 1),
          ruleTitle: info.title,
          event: renderEvent(info.event, facts),
          ...(info.measured ? { measured: true } : {}),
        }
      })
      .sort((a, b) => a.ruleId.localeCompare(b.ruleId) || a.ruleName.localeCompare(b.ruleName))
    if (this.cache.size >= CACHE_LIMIT) this.cache.clear()
    this.cache.set(key, outcomes)
    return outcomes
  }
}
