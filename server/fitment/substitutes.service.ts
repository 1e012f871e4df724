import type { Part } from '../../shared/schemas/part'
import type { Substitute, SubstitutesQuery, SubstitutesResponse } from '../../shared/schemas/substitutes'
import type { PartService } from '../catalogue/part.service'
import type { FitGraphIndex } from './fit-graph'
import { findSubstitutes, SUBSTITUTE_CAPS, type SubstituteCaps } from './substitutes'

/** Mating parts named per substitute: enough to recognise the pairing at the counter. */
const SHARED_SHOWN = 5

/** "Other heads that can replace this one": same kind, sharing its mating parts, with what differs side by side. */
export class SubstitutesService {
  constructor(
    private readonly parts: PartService,
    private readonly graphIndex: FitGraphIndex,
    private readonly caps: SubstituteCaps = SUBSTITUTE_CAPS,
  ) {}

  async substitutesFor(code: string, query: SubstitutesQuery): Promise<SubstitutesResponse> {
    const entity = await this.parts.requireEntity(code)
    const graph = await this.graphIndex.snapshot()
    const { found, capped } = findSubstitutes(graph, entity.id, this.caps)
    const page = found.slice((query.page - 1) * query.pageSize, query.page * query.pageSize)
    const byId = new Map((await this.parts.byIdsWithId(page.map((item) => item.id))).map((part) => [part.id, part]))
    const items = page.flatMap((item): Substitute[] => {
      const other = byId.get(item.id)
      if (!other) return []
      const { id: _id, ...part } = other
      return [
        {
          part,
          sharedCount: item.shared.length,
          shared: item.shared
            .map((id) => graph.partNumberOf(id))
            .sort()
            .slice(0, SHARED_SHOWN),
          differences: differences(entity.attributes, part.attributes),
        },
      ]
    })
    const { id: _id, ...part } = entity
    return { part, total: found.length, page: query.page, pageSize: query.pageSize, capped, items }
  }
}

/** The attributes that tell two parts of a kind apart, in the part's own order then the other's. */
function differences(mine: Part['attributes'], theirs: Part['attributes']): Substitute['differences'] {
  const names = [...new Set([...Object.keys(mine), ...Object.keys(theirs)])]
  return names.flatMap((name) => {
    const a = mine[name] ?? null
    const b = theirs[name] ?? null
    return a === b ? [] : [{ name, this: a, other: b }]
  })
}
