import type { DataSource } from 'typeorm'
import { inTransaction } from '../db/sqlite-connection'
import { SQL_NOW } from '../audit/change-log'
import { In } from 'typeorm'
import type { Modification } from '../../shared/schemas/fitment'
import { ModificationEntity } from './modification.entity'
import type { ModificationSpec } from '../reasoning/rule-file.schema'

export function toModification(entity: ModificationEntity): Modification {
  return {
    name: entity.name,
    title: entity.title,
    summary: entity.summary,
    steps: entity.steps,
    extraParts: entity.extraParts,
    consumables: entity.consumables,
    skillLevel: entity.skillLevel,
    timeMinutes: entity.timeMinutes,
    cautions: entity.cautions,
    status: entity.status,
  }
}

/** Stand-in for a name no catalogue entry has yet (an import may name one before an editor writes it up). */
export function unknownModification(name: string): Modification {
  return {
    name,
    title: name,
    summary: 'Not yet described by an editor.',
    steps: [],
    extraParts: [],
    consumables: [],
    skillLevel: 'skilled',
    timeMinutes: null,
    cautions: [],
    status: 'proposed',
  }
}

export class ModificationService {
  constructor(private readonly dataSource: DataSource) {}

  /**
   * Writes the shipped catalogue (rules/catalogue/modifications.json) into the
   * database at start-up, so rules and reviewed links name the same entries.
   * One transaction; entries that already read the same are left alone.
   */
  async syncShipped(specs: ModificationSpec[]): Promise<void> {
    await inTransaction(this.dataSource, (db) => {
      const find = db.prepare('SELECT * FROM modification WHERE name = ?')
      const upsert = db.prepare(
        `INSERT INTO modification (name, title, summary, steps, extraParts, consumables, skillLevel, timeMinutes, cautions, status, source)
         VALUES (@name, @title, @summary, @steps, @extraParts, @consumables, @skillLevel, @timeMinutes, @cautions, 'approved', 'rules')
         ON CONFLICT(name) DO UPDATE SET title = @title, summary = @summary, steps = @steps, extraParts = @extraParts, consumables = @consumables,
           skillLevel = @skillLevel, timeMinutes = @timeMinutes, cautions = @cautions, status = 'approved', source = 'rules', updatedAt = ${SQL_NOW}`,
      )
      for (const spec of specs) {
        const row = {
          ...spec,
          steps: JSON.stringify(spec.steps),
          extraParts: JSON.stringify(spec.extraParts),
          consumables: JSON.stringify(spec.consumables),
          cautions: JSON.stringify(spec.cautions),
        }
        const current = find.get(spec.name) as Record<string, unknown> | undefined
        const same =
          current?.status === 'approved' &&
          current.source === 'rules' &&
          (Object.keys(row) as (keyof typeof row)[]).every((key) => current[key] === row[key])
        if (!same) upsert.run(row)
      }
    })
  }

  async list(): Promise<Modification[]> {
    const all = await this.dataSource.getRepository(ModificationEntity).find({ order: { name: 'ASC' } })
    return all.map(toModification)
  }

  /** The named modifications, in the order asked, with stand-ins for unknown names. */
  async byNames(names: string[]): Promise<Map<string, Modification>> {
    const unique = [...new Set(names)]
    if (unique.length === 0) return new Map()
    const found = await this.dataSource.getRepository(ModificationEntity).findBy({ name: In(unique) })
    const byName = new Map(found.map((entity) => [entity.name, toModification(entity)]))
    return new Map(unique.map((name) => [name, byName.get(name) ?? unknownModification(name)]))
  }
}
