import type { Engine } from 'json-rules-engine'

const EPSILON = 1e-9
const isNumber = (value: unknown): value is number => typeof value === 'number' && Number.isFinite(value)
const defined = (value: unknown) => value !== undefined && value !== null && value !== ''

function same(a: unknown, b: unknown): boolean {
  if (isNumber(a) && isNumber(b)) return Math.abs(a - b) < EPSILON
  return a === b
}

/*
 * Our operators compare only values that are there: a missing attribute never
 * makes a rule fire (plain notEqual would say undefined differs from 86).
 */
const OPERATOR_FUNCTIONS: Record<string, (fact: unknown, value: unknown) => boolean> = {
  is: (fact, value) => defined(fact) && defined(value) && same(fact, value),
  isNot: (fact, value) => defined(fact) && defined(value) && !same(fact, value),
  below: (fact, value) => isNumber(fact) && isNumber(value) && fact < value - EPSILON,
  atMost: (fact, value) => isNumber(fact) && isNumber(value) && fact <= value + EPSILON,
  above: (fact, value) => isNumber(fact) && isNumber(value) && fact > value + EPSILON,
  atLeast: (fact, value) => isNumber(fact) && isNumber(value) && fact >= value - EPSILON,
  present: (fact, value) => defined(fact) === (value !== false),
  absent: (fact, value) => !defined(fact) === (value !== false),
  twiceOf: (fact, value) => isNumber(fact) && isNumber(value) && same(fact, 2 * value),
  notTwiceOf: (fact, value) => isNumber(fact) && isNumber(value) && !same(fact, 2 * value),
}

export function addOperators(engine: Engine) {
  for (const [name, evaluate] of Object.entries(OPERATOR_FUNCTIONS)) engine.addOperator(name, evaluate)
}
