import type { DataSource } from 'typeorm'
import { editDistance } from '../../shared/edit-distance'
import { normalisePartCode } from '../../shared/schemas/part'
import { NEAR_MATCH_MAX_DISTANCE, type PartLookup } from '../../shared/schemas/part-lookup'
import { databaseOf } from '../db/sqlite-connection'
import { NearNumbersRepository, oneSlipKeys, prefixWindows } from './near-numbers.repository'
import type { PartService } from './part.service'
import { toPart } from './part.repository'

/** Near matches and marks shown at most: a counter reads a short list, not a catalogue. */
const NEAR_LIMIT = 10
const MARK_LIMIT = 10

/**
 * What a typed number names: the part itself (by number or mark), numbers a
 * character or two away (a misread digit, a dropped dash is no difference at
 * all since keys ignore punctuation), and marks that contain the text.
 */
export class PartLookupService {
  private readonly near: NearNumbersRepository

  constructor(
    dataSource: DataSource,
    private readonly parts: PartService,
  ) {
    this.near = new NearNumbersRepository(databaseOf(dataSource))
  }

  async lookup(q: string): Promise<PartLookup> {
    const resolved = await this.parts.resolve(q)
    const key = normalisePartCode(q)
    const windows = key ? prefixWindows(key) : []
    const slips = key ? oneSlipKeys(key) : []
    const exactId = resolved?.entity.id
    const distances = new Map<number, number>()
    for (const row of await this.near.partKeys(slips, windows)) {
      if (row.id === exactId) continue
      const distance = editDistance(key, row.key, NEAR_MATCH_MAX_DISTANCE)
      if (distance > 0 && distance <= NEAR_MATCH_MAX_DISTANCE) distances.set(row.id, distance)
    }
    const nearIds = [...distances.keys()]
    const marks = (await this.near.markKeys([], key ? [key] : []))
      .filter((row) => row.partId !== exactId && row.key.includes(key))
      .slice(0, MARK_LIMIT)
    const found = new Map(
      (await this.parts.byIdsWithId([...nearIds, ...marks.map((row) => row.partId)])).map((part) => [part.id, part] as const),
    )
    const near = nearIds
      .flatMap((id) => {
        const part = found.get(id)
        return part ? [{ part, distance: distances.get(id)! }] : []
      })
      .sort((a, b) => a.distance - b.distance || a.part.partNumber.localeCompare(b.part.partNumber))
      .slice(0, NEAR_LIMIT)
    return {
      q,
      part: resolved ? toPart(resolved.entity) : null,
      resolvedFrom: resolved?.resolvedFrom ?? null,
      near: near.map(({ part, distance }) => ({ part: toPart(part), distance })),
      marks: marks.flatMap((row) => {
        const part = found.get(row.partId)
        return part ? [{ part: toPart(part), mark: { type: row.type, value: row.value } }] : []
      }),
    }
  }
}
