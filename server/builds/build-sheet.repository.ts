import type { Database, SqlValue } from '../db/database'
import type { FaceFinish } from '../../shared/schemas/build'

/** What a build sheet stores besides its id, owner and times (the entity's columns). */
export type BuildSheetRow = {
  name: string
  slots: Record<string, string>
  targetPowerKw: number | null
  fuelOctane: number | null
  chassisModelYear: number | null
  vin: string | null
  vehicleId: number | null
  faceFinish: FaceFinish | null
  notes: string
  checklist: Record<string, number[]>
  savedVerdict: string | null
  labourMinutes: number | null
}

const COLUMNS = [
  'name',
  'slots',
  'targetPowerKw',
  'fuelOctane',
  'chassisModelYear',
  'vin',
  'vehicleId',
  'faceFinish',
  'notes',
  'checklist',
  'savedVerdict',
  'labourMinutes',
] as const satisfies readonly (keyof BuildSheetRow)[]

/** JSON columns are stored as TypeORM's simple-json writes them, so the entity reads them back. */
function values(row: BuildSheetRow): SqlValue[] {
  return COLUMNS.map((column) => {
    const value = row[column]
    if (column === 'slots' || column === 'checklist' || column === 'faceFinish') return value === null ? null : JSON.stringify(value)
    return value as SqlValue
  })
}

/**
 * Build sheet writes through the data port, which waits its turn while the import
 * worker holds SQLite's write lock (a TypeORM repository write would fail at once);
 * the service reads through the entity.
 */
export class BuildSheetRepository {
  constructor(private readonly db: Database) {}

  insert(ownerId: number, row: BuildSheetRow): Promise<number> {
    const now = new Date()
    const names = ['ownerId', ...COLUMNS, 'createdAt', 'updatedAt'].map((name) => `"${name}"`).join(', ')
    const marks = Array.from({ length: COLUMNS.length + 3 }, () => '?').join(', ')
    return this.db.insert(`INSERT INTO build_sheet (${names}) VALUES (${marks}) RETURNING "id"`, [ownerId, ...values(row), now, now])
  }

  async update(id: number, row: BuildSheetRow): Promise<void> {
    const sets = [...COLUMNS, 'updatedAt'].map((name) => `"${name}" = ?`).join(', ')
    await this.db.run(`UPDATE build_sheet SET ${sets} WHERE "id" = ?`, [...values(row), new Date(), id])
  }

  async remove(id: number): Promise<void> {
    await this.db.run('DELETE FROM build_sheet WHERE "id" = ?', [id])
  }
}
