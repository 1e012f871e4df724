import { BUILD_SLOTS, MATING_PAIRS, type SlotId } from '../../shared/build-template'
import { DEFERENCE } from '../../shared/advisory'
import { validateVin, vinModelYear } from '../../shared/engineering/vin'
import type { AppliedModification, BuildContext, Caution, EvaluateRequest, Evaluation, PairJudgement } from '../../shared/schemas/build'
import type { FieldReportEvidence } from '../field-reports/field-report-evidence'
import { worstVerdict } from '../../shared/schemas/fitment'
import type { Part } from '../../shared/schemas/part'
import { partKindSchema } from '../../shared/schemas/part-kinds'
import { buildFacts } from '../reasoning/facts'
import { cylinders } from '../reasoning/figures'
import { computeFigures } from '../reasoning/figure-facts'
import { summariseFigures } from '../reasoning/figures-summary'
import { judgePair, type JudgedPair } from '../fitment/pair-judge'
import { summariseOutcomes } from '../reasoning/rule-summary'
import { buildPartsList } from '../reasoning/parts-list'
import type { Facts, RuleBook } from '../reasoning/rule-book'
import type { RuleExtraPart } from '../reasoning/rule-file.schema'
import { resolveSlots } from './build-slots'
import { judgeCompliance } from './compliance'
import { findCompanions } from '../fitment/companions'
import { toPart } from '../catalogue/part.repository'
import type { FitGraph, FitGraphIndex } from '../fitment/fit-graph'
import type { ModificationService } from '../catalogue/modification.service'
import type { PartService } from '../catalogue/part.service'
import type { PartsListShelf } from '../stock/parts-list-shelf'

/** A build with its slots resolved to parts, ready to judge. */
export type ResolvedBuild = {
  parts: Partial<Record<SlotId, Part>>
  ids: Partial<Record<SlotId, number>>
  context: BuildContext
  contextCautions: Caution[]
}

/** A VIN gives the chassis model year when none is given; a bad check digit only warns (optional outside North America). */
export function normaliseContext(context: BuildContext): { context: BuildContext; cautions: Caution[] } {
  if (!context.vin) return { context, cautions: [] }
  const check = validateVin(context.vin)
  const cautions: Caution[] = check.valid
    ? []
    : [{ severity: 'warning', text: `VIN ${context.vin}: ${check.problems.join(' ')}`, reference: '49 CFR 565.15 [published]' }]
  const year = context.chassisModelYear ?? vinModelYear(context.vin)
  return { context: { ...context, chassisModelYear: year ?? context.chassisModelYear }, cautions }
}

export class BuildEvaluationService {
  constructor(
    private readonly parts: PartService,
    private readonly graphIndex: FitGraphIndex,
    private readonly rules: RuleBook,
    private readonly modifications: ModificationService,
    private readonly evidence: FieldReportEvidence,
    private readonly shelf?: PartsListShelf,
  ) {}

  async resolve(request: EvaluateRequest): Promise<ResolvedBuild> {
    const entities = await resolveSlots(this.parts, request.slots)
    const parts: ResolvedBuild['parts'] = {}
    const ids: ResolvedBuild['ids'] = {}
    for (const [slot, entity] of entities) {
      parts[slot] = toPart(entity)
      ids[slot] = entity.id
    }
    const { slots: _slots, ...rawContext } = request
    const { context, cautions } = normaliseContext(rawContext)
    return { parts, ids, context, contextCautions: cautions }
  }

  /** The figures of a build and the facts its rules read; the graph supplies the parts a build implies without a slot. */
  prepare(build: Pick<ResolvedBuild, 'parts' | 'context'>, graph: FitGraph) {
    const figures = computeFigures(build.parts, build.context, () => findCompanions(graph, build.parts))
    const numbers = Object.fromEntries(Object.entries(build.parts).map(([slot, part]) => [slot, part!.partNumber]))
    return { figures, facts: buildFacts(build.parts, figures, build.context, numbers) }
  }

  /** Judges every mating pair whose two slots are filled. */
  async judgePairs(graph: FitGraph, build: Pick<ResolvedBuild, 'ids'>, facts: Facts, only?: SlotId): Promise<JudgedPair[]> {
    const judged: JudgedPair[] = []
    for (const pair of MATING_PAIRS) {
      const [a, b] = pair.slots
      const idA = build.ids[a]
      const idB = build.ids[b]
      if (idA === undefined || idB === undefined || (only && a !== only && b !== only)) continue
      judged.push(await judgePair(graph, this.rules, { slots: [a, b], label: pair.label, partIds: [idA, idB], facts }))
    }
    return judged
  }

  /**
   * Whether the rules alone leave a pair at `slot` unfitted (does not fit, or
   * nothing decides it): the verdict judgePairs would give a part without a
   * reviewed link to its mates, without the explanation, for screening many.
   */
  async rulesRuleOut(build: Pick<ResolvedBuild, 'ids'>, facts: Facts, slot: SlotId): Promise<boolean> {
    for (const { slots } of MATING_PAIRS) {
      const [a, b] = slots
      if ((a !== slot && b !== slot) || build.ids[a] === undefined || build.ids[b] === undefined) continue
      const outcomes = this.rules.pairOutcomes(a, b, facts)
      const { relation } = summariseOutcomes(Array.isArray(outcomes) ? outcomes : await outcomes)
      if (!relation || relation === 'does-not-fit') return true
    }
    return false
  }

  /** The cautions the whole-build rules raise for these facts (cached by the values they read). */
  async buildCautions(facts: Facts): Promise<Caution[]> {
    return summariseOutcomes(await this.rules.evaluateBuild(facts)).cautions
  }

  /** The pairs as answered: with the field reports on their deciding links, without the server's working. */
  private async withEvidence(pairs: JudgedPair[]): Promise<PairJudgement[]> {
    const evidence = await this.evidence.forLinks(pairs.flatMap((pair) => (pair.linkId === undefined ? [] : [pair.linkId])))
    return pairs.map(({ rules: _rules, linkModifications: _mods, linkId, ...pair }) => ({
      ...pair,
      fieldReports: (linkId !== undefined && evidence.get(linkId)) || pair.fieldReports,
    }))
  }

  /** `asker.homeSiteId`: the user's own site, preferred for the units the parts list takes. */
  async evaluate(request: EvaluateRequest, asker: { homeSiteId?: number | null } = {}): Promise<Evaluation> {
    const build = await this.resolve(request)
    const graph = await this.graphIndex.snapshot()
    const { figures, facts } = this.prepare(build, graph)
    const pairs = await this.judgePairs(graph, build, facts)
    const buildRules = summariseOutcomes(await this.rules.evaluateBuild(facts))

    const applied = await this.appliedModifications(pairs)
    const count = cylinders(build.parts)
    const partsList = await buildPartsList({
      parts: build.parts,
      cylinders: count,
      modifications: applied,
      extraParts: [
        ...pairs.filter((pair) => pair.relation !== 'does-not-fit').flatMap((pair) => pair.rules.extraParts),
        ...buildRules.extraParts,
      ],
      consumables: this.rules.loaded.consumables,
      findParts: async (spec) => this.findParts(graph, spec),
    }).then((lines) => this.shelf?.withUnits(lines, asker.homeSiteId ?? null) ?? lines)

    const cautions = dedupeCautions([
      ...build.contextCautions,
      ...pairs.flatMap((pair) => pair.rules.cautions),
      ...buildRules.cautions,
      DEFERENCE,
    ])
    return {
      verdict: pairs.length ? worstVerdict(pairs.map((pair) => pair.relation)) : 'unknown',
      compliance: judgeCompliance(cautions, build.context.chassisModelYear),
      missingSlots: BUILD_SLOTS.filter((slot) => !build.parts[slot.id]).map((slot) => slot.id),
      pairs: await this.withEvidence(pairs),
      modifications: applied.map(({ ruleExtraParts: _extra, ...modification }) => modification),
      partsList,
      cautions,
      figures: summariseFigures(figures, build.context),
      parts: Object.fromEntries(Object.entries(build.parts)) as Record<string, Part>,
    }
  }

  /**
   * The modifications a build needs: from the reviewed link where a link
   * decides a pair (with the rules' worked detail for the same modification),
   * otherwise from the rules. Pairs that do not fit need no modification.
   */
  private async appliedModifications(pairs: JudgedPair[]): Promise<(AppliedModification & { ruleExtraParts: RuleExtraPart[] })[]> {
    const wanted = pairs
      .filter((pair) => pair.relation === 'fits-with-modification')
      .flatMap((pair) =>
        pair.decidedBy === 'link'
          ? pair.linkModifications.map((name) => {
              const fromRule = pair.rules.modifications.find((m) => m.name === name)
              return {
                pair,
                name,
                reason: fromRule?.reason ?? `Named by the reviewed link between ${pair.partNumbers.join(' and ')}.`,
                extraParts: fromRule?.extraParts ?? [],
              }
            })
          : pair.rules.modifications.map((m) => ({ pair, name: m.name, reason: m.reason, extraParts: m.extraParts })),
      )
    const catalogue = await this.modifications.byNames(wanted.map((w) => w.name))
    const seen = new Set<string>()
    return wanted.flatMap(({ pair, name, reason, extraParts }) => {
      const key = `${name}|${pair.slots.join('|')}`
      if (seen.has(key)) return []
      seen.add(key)
      return [{ ...catalogue.get(name)!, slots: pair.slots, reason, ruleExtraParts: extraParts }]
    })
  }

  /** Catalogue parts of a kind whose attributes equal the ones asked for, in part-number order, from the fit graph. */
  findParts(graph: FitGraph, spec: { kind: string; attributes?: Record<string, string> }): string[] {
    const kind = partKindSchema.safeParse(spec.kind)
    if (!kind.success) return []
    const wanted = Object.entries(spec.attributes ?? {})
    return graph
      .partsOfKind(kind.data)
      .filter((id) => {
        const { attributes } = graph.ruleClasses.input(graph.ruleClasses.classOf(id))
        return wanted.every(([name, value]) => String(attributes[name]) === value)
      })
      .map((id) => graph.partNumberOf(id))
  }
}

const SEVERITY_ORDER = { danger: 0, warning: 1, info: 2 }

/** Each caution once, the ones that can hurt someone first. */
export function dedupeCautions(cautions: Caution[]): Caution[] {
  const seen = new Set<string>()
  return cautions
    .filter((caution) => !seen.has(caution.text) && seen.add(caution.text))
    .sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity])
}
