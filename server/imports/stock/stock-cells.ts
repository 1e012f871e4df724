import { validateVin, vinCheckDigit } from '../../../shared/engineering/vin'
import { type STOCK_COLUMNS } from '../../../shared/import-files'
import { MAX_CENTS, centsToDecimal, decimalToCents } from '../../../shared/money'
import { STOCK_CONDITIONS, STOCK_STATUSES, type USED_GRADES, type StockCondition, type StockStatus } from '../../../shared/schemas/stock'

export type StockColumn = (typeof STOCK_COLUMNS)[number]
type Grade = (typeof USED_GRADES)[number]

/** One unit in the terms of a stock file: names, not ids; money in cents. */
export type StockUnit = {
  partNumber: string
  site: string
  condition: StockCondition
  grade: Grade | null
  priceCents: number
  coreChargeCents: number
  location: string
  mileageKm: number | null
  donorVin: string | null
  donorYear: number | null
  status: StockStatus
  damageNotes: string
  label: string | null
}

export type Problem = (column: string, message: string) => void

const CONDITION = /^(new|remanufactured|used|core)(?:[\s/-]+(?:grade\s*)?([abc]))?$/i

/** A decimal amount in the shop's currency as integer cents. */
export function parseMoney(text: string, column: string, problem: Problem): number {
  const reading = decimalToCents(text)
  if (reading.ok) return reading.cents
  if (reading.problem === 'negative') problem(column, `${column} cannot be negative (${text}).`)
  else if (reading.problem === 'too_large') problem(column, `${text} is more than ${MAX_CENTS / 100}.`)
  else problem(column, `"${text}" is not an amount; write it as a decimal like 125.50, without a currency sign.`)
  return 0
}

export const formatMoney = centsToDecimal

export function parseCondition(text: string, problem: Problem): { condition: StockCondition; grade: Grade | null } {
  const match = CONDITION.exec(text)
  if (!match) {
    problem(
      'condition',
      `"${text}" is not a condition; use ${STOCK_CONDITIONS.join(', ')}, and for a used part its grade: used A, used B or used C.`,
    )
    return { condition: 'new', grade: null }
  }
  const condition = match[1]!.toLowerCase() as StockCondition
  const grade = match[2] ? (match[2].toUpperCase() as Grade) : null
  if (grade && condition !== 'used') problem('condition', `Only used parts carry a grade; write ${condition} alone.`)
  return { condition, grade }
}

export const formatCondition = (unit: Pick<StockUnit, 'condition' | 'grade'>) =>
  unit.grade ? `${unit.condition} ${unit.grade}` : unit.condition

export function parseStatus(text: string, problem: Problem): StockStatus {
  const status = (text.toLowerCase() || 'available') as StockStatus
  if (!(STOCK_STATUSES as readonly string[]).includes(status))
    problem('status', `"${text}" is not a status; use ${STOCK_STATUSES.join(', ')}.`)
  return status
}

/** A donor VIN must be one the counter could read off the car: seventeen characters and a check digit that agrees. */
export function parseDonorVin(text: string, problem: Problem): string | null {
  if (!text) return null
  const vin = text.toUpperCase()
  const check = validateVin(vin)
  if (!check.wellFormed) problem('donor_vin', `${check.problems[0] ?? 'Not a VIN'}.`)
  else if (!check.checkDigitOk)
    problem(
      'donor_vin',
      `The check digit (position 9) is ${vin.charAt(8)}, but the other positions give ${vinCheckDigit(vin)}; read the VIN again.`,
    )
  return vin
}

export function parseWhole(text: string, column: string, limits: { min: number; max: number }, problem: Problem): number | null {
  if (!text) return null
  if (!/^\d+$/.test(text)) {
    problem(column, /^-\s*\d/.test(text) ? `${column} cannot be negative (${text}).` : `"${text}" is not a whole number.`)
    return null
  }
  const value = Number(text)
  if (value < limits.min || value > limits.max) problem(column, `${column} is ${limits.min} to ${limits.max}; this row says ${value}.`)
  return value
}

/** A unit as the cells of a stock file, the form both the export and the preview's before and after show. */
export function stockCells(unit: StockUnit): Record<StockColumn, string> {
  return {
    part_number: unit.partNumber,
    site: unit.site,
    condition: formatCondition(unit),
    price: formatMoney(unit.priceCents),
    core_charge: formatMoney(unit.coreChargeCents),
    location: unit.location,
    mileage_km: unit.mileageKm === null ? '' : String(unit.mileageKm),
    donor_vin: unit.donorVin ?? '',
    donor_year: unit.donorYear === null ? '' : String(unit.donorYear),
    status: unit.status,
    notes: unit.damageNotes,
    label: unit.label ?? '',
  }
}
