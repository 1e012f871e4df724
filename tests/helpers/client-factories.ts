import type { Candidate, Evaluation, PairJudgement } from '../../shared/schemas/build'
import type { FitResult } from '../../shared/schemas/fitment'
import type { Part } from '../../shared/schemas/part'
import { NO_STOCK } from '../../shared/schemas/stock'
import type { PartKind } from '../../shared/schemas/part-kinds'

/** A part with only what a test names; the rest is plain filler. */
export function makePart(partNumber: string, kind: PartKind, overrides: Partial<Part> = {}): Part {
  return {
    partNumber,
    kind,
    name: `${partNumber} name`,
    family: 'ZX',
    yearFrom: null,
    yearTo: null,
    notes: '',
    attributes: {},
    marks: [],
    ...overrides,
  }
}

export function makeFit(part: Part, relation: FitResult['relation'], review: FitResult['review'] = 'approved'): FitResult {
  return {
    part,
    relation,
    decidedBy: review === 'inferred' ? 'rule' : 'link',
    review,
    ruleIds: [],
    modifications: [],
    explanation: [],
    fieldReports: { confirmed: 0, contradicted: 0 },
    stock: { ...NO_STOCK },
  }
}

export function makeCandidate(part: Part, relation: Candidate['relation'] = 'fits'): Candidate {
  return { part, relation, modifications: [], score: 0, reasons: [], setBackFor: [], stock: { ...NO_STOCK } }
}

export function makePair(
  slots: [string, string],
  relation: PairJudgement['relation'],
  label = `${slots[0]} with ${slots[1]}`,
): PairJudgement {
  return {
    slots,
    label,
    partNumbers: ['A-1', 'B-1'],
    relation,
    decidedBy: 'rule',
    reason: `${label}: ${relation}`,
    ruleIds: [],
    modifications: [],
    explanation: [{ type: 'rule', text: `${label}: ${relation}` }],
    fieldReports: { confirmed: 0, contradicted: 0 },
  }
}

export function makeEvaluation(overrides: Partial<Evaluation> = {}): Evaluation {
  return {
    verdict: 'fits',
    compliance: { status: 'ok', reasons: [] },
    missingSlots: [],
    pairs: [],
    modifications: [],
    partsList: [],
    cautions: [],
    figures: {
      displacementCc: null,
      compressionRatio: null,
      sweptVolumeCc: null,
      clearanceVolumeCc: null,
      injectorHeadroomPct: null,
      injectorNeededCcMin: null,
      injectorAvailableCcMin: null,
      headBoltProjectionMm: null,
      threadEngagementMinMm: null,
      headBoltMaxProjectionMm: null,
      headBoltLengthRangeMm: null,
      washerStackMm: null,
      camCrankCentreMm: null,
      beltCentreShiftMm: null,
      beltTeethNeeded: null,
      quenchMm: null,
      chassisModelYear: null,
    },
    parts: {},
    ...overrides,
  }
}
