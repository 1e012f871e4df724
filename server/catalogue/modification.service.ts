import type { DataSource } from 'typeorm'
import { databaseOf } from '../db/sqlite-connection'
import { placeholders } from '../db/database'
import { In } from 'typeorm'
import type { Modification } from '../../shared/schemas/fitment'
import { ModificationEntity } from './modification.entity'
import type { ModificationSpec } from '../reasoning/rule-file.schema'
import { unknownModification } from './unknown-modification'

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

export class ModificationService {
  constructor(private readonly dataSource: DataSource) {}

  /**
   * Writes the shipped catalogue (rules/catalogue/modifications.json) into the
   * database at start-up, so rules and reviewed links name the same entries.
   * One transaction; entries that already read the same are left alone.
   */
  async syncShipped(specs: ModificationSpec[]): Promise<void> {
    const columns = ['name', 'title', 'summary', 'steps', 'extraParts', 'consumables', 'skillLevel', 'timeMinutes', 'cautions'] as const
    await databaseOf(this.dataSource).transaction(async (tx) => {
      for (const spec of specs) {
        const row = {
          ...spec,
          steps: JSON.stringify(spec.steps),
          extraParts: JSON.stringify(spec.extraParts),
          consumables: JSON.stringify(spec.consumables),
          cautions: JSON.stringify(spec.cautions),
        }
        const current = await tx.get<Record<string, unknown>>('SELECT * FROM modification WHERE "name" = ?', [spec.name])
        const values = columns.map((column) => row[column] ?? null)
        if (!current) {
          await tx.run(
            `INSERT INTO modification (${columns.map((c) => `"${c}"`).join(', ')}, "status", "source")
             VALUES (${placeholders(columns.length)}, 'approved', 'rules')`,
            values,
          )
          continue
        }
        const same =
          current.status === 'approved' && current.source === 'rules' && columns.every((column) => current[column] === row[column])
        if (same) continue
        await tx.run(
          `UPDATE modification SET ${columns
            .slice(1)
            .map((c) => `"${c}" = ?`)
            .join(', ')}, "status" = 'approved', "source" = 'rules', "updatedAt" = ? WHERE "name" = ?`,
          [...values.slice(1), new Date(), spec.name],
        )
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
