import { SLOT_IDS, type SlotId } from '../../shared/build-template'
import { vinCheckDigit, vinModelYear, validateVin } from '../../shared/engineering/vin'
import type { Vehicle, VehicleChoices, VehicleInput, VehicleQuery, VinAnswer } from '../../shared/schemas/vehicles'
import { AppError } from '../errors/app-error'
import type { PartService } from '../catalogue/part.service'
import { DEMO_WMI } from './demo-makers'
import type { OriginalRow, VehicleRepository, VehicleRow } from './vehicle.repository'

const SLOT_ORDER = new Map<string, number>(SLOT_IDS.map((slot, index) => [slot, index]))
const LIST_LIMIT = 200

/** Each character a VIN cannot hold, by its position (1 to 17), so the counter knows which one to read again. */
function positionProblems(vin: string): string[] {
  return [...vin.slice(0, 17)].flatMap((char, index) => {
    if (/[IOQ]/.test(char))
      return [`Position ${index + 1} is ${char}, which a VIN never holds: read it again as ${char === 'I' ? '1' : '0'}`]
    if (!/[0-9A-Z]/.test(char)) return [`Position ${index + 1} is "${char}": a VIN holds only letters and digits`]
    return []
  })
}

function toVehicle(row: VehicleRow, originals: OriginalRow[]): Vehicle {
  return {
    ...row,
    originals: originals
      .filter((original) => original.vehicleId === row.id)
      .sort((a, b) => (SLOT_ORDER.get(a.slot) ?? 99) - (SLOT_ORDER.get(b.slot) ?? 99))
      .map(({ slot, partNumber, name }) => ({ slot, partNumber, name })),
  }
}

/** Vehicle applications: find a car by year, make and model or by its VIN, and the parts it left the factory with. */
export class VehicleService {
  constructor(
    private readonly repository: VehicleRepository,
    private readonly parts: PartService,
  ) {}

  async create(input: VehicleInput): Promise<Vehicle> {
    const originals: { slot: SlotId; partId: number }[] = []
    for (const [slot, partNumber] of Object.entries(input.originals) as [SlotId, string][]) {
      originals.push({ slot, partId: await this.parts.requireId(partNumber, `originals.${slot}`) })
    }
    const { originals: _originals, ...vehicle } = input
    return this.get(await this.repository.insert(vehicle, originals))
  }

  async find(query: VehicleQuery): Promise<Vehicle[]> {
    const rows = await this.repository.find(query, LIST_LIMIT)
    const originals = await this.repository.originalsOf(rows.map((row) => row.id))
    return rows.map((row) => toVehicle(row, originals))
  }

  /** The makes for a year, and the models for a year and make: the cascading choices at the counter. */
  async choices(query: VehicleQuery): Promise<VehicleChoices> {
    const makes = await this.repository.distinct('make', { year: query.year })
    const models = query.make ? await this.repository.distinct('model', { year: query.year, make: query.make }) : []
    return { makes, models }
  }

  async get(id: number): Promise<Vehicle> {
    const row = await this.repository.byId(id)
    if (!row) throw AppError.notFound(`No vehicle application ${id}.`)
    return toVehicle(row, await this.repository.originalsOf([id]))
  }

  /** Decodes a VIN: its check digit, model year and maker, and the applications that match. A malformed VIN is a 400 naming the position. */
  async byVin(input: string): Promise<VinAnswer> {
    const vin = input.trim().toUpperCase()
    const check = validateVin(vin)
    if (!check.wellFormed) {
      const problems = [...positionProblems(vin), ...check.problems]
      throw AppError.badRequest(
        `${problems[0]}.`,
        problems.slice(0, 5).map((message) => ({ path: 'vin', message })),
      )
    }
    const expected = vinCheckDigit(vin)
    const modelYear = vinModelYear(vin)
    const wmi = DEMO_WMI[vin.slice(0, 3)]
    const applications = wmi ? await this.find({ year: modelYear ?? undefined, make: wmi.make }) : []
    return {
      vin,
      checkDigit: { valid: check.checkDigitOk, expected, found: vin.charAt(8) },
      modelYear,
      maker: wmi?.maker ?? null,
      applications,
    }
  }
}
