import type { Part } from '../../shared/schemas/part'
import { MARK_TYPES } from '../../shared/schemas/part'
import type { PartEntity } from '../entities/part.entity'

export function toPart(entity: PartEntity): Part {
  const marks = (entity.marks ?? [])
    .map((mark) => ({ type: mark.type, value: mark.value }))
    .sort((a, b) => MARK_TYPES.indexOf(a.type) - MARK_TYPES.indexOf(b.type) || a.value.localeCompare(b.value))
  return {
    partNumber: entity.partNumber,
    kind: entity.kind,
    name: entity.name,
    family: entity.family,
    yearFrom: entity.yearFrom,
    yearTo: entity.yearTo,
    notes: entity.notes,
    attributes: entity.attributes,
    marks,
  }
}
