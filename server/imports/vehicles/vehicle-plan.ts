import { chunks, placeholders, type Database } from '../../db/database'
import { BUILD_SLOTS, SLOT_IDS, type SlotId } from '../../../shared/build-template'
import { slotColumn } from '../../../shared/import-files'
import type { FieldChange, ImportIssue } from '../../../shared/schemas/imports'
import { unknownPartMessages } from '../unknown-part'
import { ChangeList } from '../import-change-list'
import { describeVehicle, type VehicleEntry, type VehicleKey, type VehicleRows } from './vehicle-rows'

export type VehicleRecord = {
  id: number
  yearFrom: number
  yearTo: number
  make: string
  model: string
  body: string
  market: string
  engineFamily: string
  batchId: number | null
}
export type OriginalRecord = { vehicleId: number; slot: string; partId: number }

/** Part ids by slot, as the application will have them. */
export type Originals = Map<SlotId, number>

export type VehiclesPlan = {
  changes: ChangeList
  issues: ImportIssue[]
  creates: { key: VehicleKey; originals: Originals }[]
  updates: { previous: VehicleRecord; previousOriginals: OriginalRecord[]; originals: Originals }[]
}

const SLOT_LABEL = new Map(BUILD_SLOTS.map((slot) => [slot.id, slot.label.toLowerCase()]))

function originalChanges(before: Originals, after: Originals, numberOf: (id: number) => string): FieldChange[] {
  return SLOT_IDS.flatMap((slot) => {
    const was = before.get(slot)
    const is = after.get(slot)
    if (was === is) return []
    return [{ field: slotColumn(slot), before: was === undefined ? '' : numberOf(was), after: is === undefined ? '' : numberOf(is) }]
  })
}

/**
 * Weighs the checked applications against the catalogue: every part number
 * must be a part of the slot's kind, an application the catalogue has gets
 * its original parts updated, a new one is created. A file without body or
 * market columns matches on the other fields, as long as that names one
 * application.
 */
export async function planVehicles(db: Database, rows: VehicleRows): Promise<VehiclesPlan> {
  const entries = [...rows.entries()]
  const baseKey = (v: Omit<VehicleKey, 'body' | 'market'>) => JSON.stringify([v.yearFrom, v.yearTo, v.make, v.model, v.engineFamily])
  const { stored, storedOriginals } = await namedApplications(db, entries, baseKey)
  const named = entries.flatMap((entry) => [...entry.originals.values()].filter((number): number is string => Boolean(number)))
  const storedIds = [...storedOriginals.values()].flatMap((list) => list.map((original) => original.partId))
  const { parts, numbers } = await partsByNumberOrId(db, named, storedIds)
  const unknownPart = unknownPartMessages(db)
  const plan: VehiclesPlan = { changes: new ChangeList(), issues: [], creates: [], updates: [] }
  const issues = rows.issues.clone()
  const reject = (entry: VehicleEntry, column: string, message: string) => {
    for (const row of entry.rows) issues.add(row, column, message)
  }
  const numberOf = (id: number) => numbers.get(id) ?? `part id ${id}`

  for (const entry of entries) {
    const given = new Map<SlotId, number | null>()
    let ok = true
    for (const [slot, partNumber] of entry.originals) {
      if (!partNumber) {
        given.set(slot, null)
        continue
      }
      const part = parts.get(partNumber)
      const column = slotColumn(slot)
      if (!part) {
        reject(entry, column, await unknownPart(partNumber))
        ok = false
      } else if (part.kind !== slot) {
        reject(entry, column, `${partNumber} is a ${part.kind} part, not a ${SLOT_LABEL.get(slot) ?? slot}.`)
        ok = false
      } else given.set(slot, part.id)
    }
    const { key } = entry
    const matches = (stored.get(baseKey(key)) ?? []).filter(
      (v) => (key.body === null || v.body === key.body) && (key.market === null || v.market === key.market),
    )
    if (matches.length > 1) {
      const message = `${describeVehicle(key)} matches ${matches.length} applications in the catalogue; add body and market columns to say which.`
      reject(entry, key.body === null ? 'body' : 'market', message)
      ok = false
    }
    if (!ok) continue
    const [firstRow] = entry.rows as [number]
    plan.changes.repeats(entry.rows.length - 1)
    const match = matches[0]
    if (!match) {
      const originals: Originals = new Map([...given].flatMap(([slot, id]) => (id === null ? [] : [[slot, id] as const])))
      plan.creates.push({ key, originals })
      plan.changes.create(
        firstRow,
        () => describeVehicle(key),
        () => [
          { field: 'year_from', before: '', after: String(key.yearFrom) },
          { field: 'year_to', before: '', after: String(key.yearTo) },
          ...originalChanges(new Map(), originals, numberOf),
        ],
      )
      continue
    }
    const previousOriginals = storedOriginals.get(match.id) ?? []
    const before: Originals = new Map(previousOriginals.map((o) => [o.slot as SlotId, o.partId]))
    // A slot column the file does not have keeps the catalogue's part; an empty cell clears it.
    const after: Originals = new Map(before)
    for (const [slot, id] of given) {
      if (id === null) after.delete(slot)
      else after.set(slot, id)
    }
    const fields = originalChanges(before, after, numberOf)
    plan.changes.compare(firstRow, describeVehicle({ ...key, body: match.body, market: match.market }), fields)
    if (fields.length) plan.updates.push({ previous: match, previousOriginals, originals: after })
  }
  plan.changes.rejected(issues.count)
  plan.issues = issues.sorted()
  return plan
}

type Part = { id: number; partNumber: string; kind: string }

/** The parts the file names (by number) and the catalogue's applications hold (by id), a chunk at a time. */
async function partsByNumberOrId(db: Database, named: readonly string[], ids: readonly number[]) {
  const parts = new Map<string, Part>()
  const numbers = new Map<number, string>()
  const keep = (found: Part[]) => {
    for (const part of found) {
      parts.set(part.partNumber, part)
      numbers.set(part.id, part.partNumber)
    }
  }
  for (const chunk of chunks([...new Set(named)])) {
    keep(await db.all<Part>(`SELECT "id", "partNumber", "kind" FROM part WHERE "partNumber" IN (${placeholders(chunk.length)})`, chunk))
  }
  for (const chunk of chunks([...new Set(ids)].filter((id) => !numbers.has(id)))) {
    keep(await db.all<Part>(`SELECT "id", "partNumber", "kind" FROM part WHERE "id" IN (${placeholders(chunk.length)})`, chunk))
  }
  return { parts, numbers }
}

/** The applications of the makes and models the file names (through their index), by base key, with their original parts. */
async function namedApplications(
  db: Database,
  entries: readonly VehicleEntry[],
  baseKey: (v: Omit<VehicleKey, 'body' | 'market'>) => string,
) {
  const models = new Map(entries.map(({ key }) => [JSON.stringify([key.make, key.model]), [key.make, key.model] as const]))
  const vehicles: VehicleRecord[] = []
  for (const chunk of chunks([...models.values()], 250)) {
    vehicles.push(
      ...(await db.all<VehicleRecord>(
        `SELECT * FROM vehicle_application WHERE ${chunk.map(() => '("make" = ? AND "model" = ?)').join(' OR ')}`,
        chunk.flat(),
      )),
    )
  }
  vehicles.sort((a, b) => a.id - b.id)
  const stored = new Map<string, VehicleRecord[]>()
  for (const vehicle of vehicles) {
    const list = stored.get(baseKey(vehicle))
    if (list) list.push(vehicle)
    else stored.set(baseKey(vehicle), [vehicle])
  }
  const storedOriginals = new Map<number, OriginalRecord[]>()
  for (const ids of chunks(vehicles.map((vehicle) => vehicle.id))) {
    for (const original of await db.all<OriginalRecord>(
      `SELECT * FROM vehicle_original WHERE "vehicleId" IN (${placeholders(ids.length)}) ORDER BY "vehicleId", "slot"`,
      ids,
    )) {
      const list = storedOriginals.get(original.vehicleId)
      if (list) list.push(original)
      else storedOriginals.set(original.vehicleId, [original])
    }
  }
  return { stored, storedOriginals }
}
