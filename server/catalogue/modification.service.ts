import type { DataSource } from 'typeorm'
import { databaseOf } from '../db/sqlite-connection'
import { chunks, placeholders } from '../db/database'
import type { Modification } from '../../shared/schemas/fitment'
import type { ModificationSpec } from '../reasoning/rule-file.schema'
import { unknownModification } from './unknown-modification'

const COLUMNS = '"name", "title", "summary", "steps", "extraParts", "consumables", "skillLevel", "timeMinutes", "cautions", "status"'

/** A modification row as the port reads it: the lists are JSON text on both drivers. */
type ModificationRow = Omit<Modification, 'steps' | 'extraParts' | 'consumables' | 'cautions'> & {
  steps: string
  extraParts: string
  consumables: string
  cautions: string
}

function fromRow(row: ModificationRow): Modification {
  return {
    ...row,
    steps: JSON.parse(row.steps) as Modification['steps'],
    extraParts: JSON.parse(row.extraParts) as Modification['extraParts'],
    consumables: JSON.parse(row.consumables) as Modification['consumables'],
    cautions: JSON.parse(row.cautions) as Modification['cautions'],
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
    const rows = await databaseOf(this.dataSource).all<ModificationRow>(`SELECT ${COLUMNS} FROM modification ORDER BY "name"`)
    return rows.map(fromRow)
  }

  /** The named modifications, in the order asked, with stand-ins for unknown names. */
  async byNames(names: string[]): Promise<Map<string, Modification>> {
    const unique = [...new Set(names)]
    if (unique.length === 0) return new Map()
    const db = databaseOf(this.dataSource)
    const byName = new Map<string, Modification>()
    for (const chunk of chunks(unique)) {
      const rows = await db.all<ModificationRow>(
        `SELECT ${COLUMNS} FROM modification WHERE "name" IN (${placeholders(chunk.length)})`,
        chunk,
      )
      for (const row of rows) byName.set(row.name, fromRow(row))
    }
    return new Map(unique.map((name) => [name, byName.get(name) ?? unknownModification(name)]))
  }
}
