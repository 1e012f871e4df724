import type { EntityManager } from 'typeorm'
import type { PartInput } from '../../shared/schemas/part-input'
import { normalisePartCode } from '../../shared/schemas/part'
import { PartMarkEntity } from '../entities/part-mark.entity'
import { PartEntity } from '../entities/part.entity'

export function partColumns(part: PartInput) {
  return {
    partNumber: part.partNumber,
    partKey: normalisePartCode(part.partNumber),
    kind: part.kind,
    name: part.name,
    family: part.family,
    yearFrom: part.yearFrom,
    yearTo: part.yearTo,
    notes: part.notes,
    attributes: part.attributes,
  }
}

export function markRows(partId: number, part: PartInput) {
  return part.marks.map((mark) => ({ partId, type: mark.type, value: mark.value, valueKey: normalisePartCode(mark.value) }))
}

/** Inserts new parts with their marks, inside the caller's transaction. */
export async function insertParts(manager: EntityManager, parts: PartInput[]): Promise<Map<string, number>> {
  const ids = new Map<string, number>()
  for (const part of parts) {
    const result = await manager.insert(PartEntity, partColumns(part))
    const id = result.identifiers[0]?.id as number
    ids.set(part.partNumber, id)
    const marks = markRows(id, part)
    if (marks.length) await manager.insert(PartMarkEntity, marks)
  }
  return ids
}
