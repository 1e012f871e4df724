import { readdirSync, readFileSync } from 'node:fs'
import path from 'node:path'
import type { DataSource } from 'typeorm'
import type { Role } from '../../shared/schemas/auth'
import type { PartInput } from '../../shared/schemas/part-input'
import { parsePartRow } from '../csv/part-row'
import { readCsvText } from '../csv/read-csv'
import { PartEntity } from '../entities/part.entity'
import { UserEntity } from '../entities/user.entity'
import { insertParts } from '../services/part-writer'
import type { UserService } from '../services/user.service'

export const DEMO_PASSWORD = 'fitwright-demo'
export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@fitwright.test', name: 'Ines Marlow', role: 'admin' },
  { email: 'editor@fitwright.test', name: 'Tobias Ferrand', role: 'editor' },
  { email: 'counter@fitwright.test', name: 'Rosa Quint', role: 'counter' },
  { email: 'tech@fitwright.test', name: 'Dario Lenk', role: 'tech' },
]

/** Reads every parts file of the demo scenario; a bad row is a bug in the scenario. */
export function readDemoParts(demoDir: string): PartInput[] {
  const partsDir = path.join(demoDir, 'parts')
  return readdirSync(partsDir)
    .filter((file) => file.endsWith('.csv'))
    .sort()
    .flatMap((file) =>
      readCsvText(readFileSync(path.join(partsDir, file), 'utf8')).rows.map((row, index) => {
        const result = parsePartRow(row)
        if (!result.ok) {
          const problems = result.errors.map((e) => `${e.column}: ${e.message}`).join('; ')
          throw new Error(`Demo data ${file} row ${index + 2}: ${problems}`)
        }
        return result.part
      }),
    )
}

/**
 * Seeds the invented demo scenario into an empty database (no users, no parts).
 * Returns whether it seeded.
 */
export async function seedDemo(dataSource: DataSource, users: UserService, demoDir: string): Promise<boolean> {
  const [userCount, partCount] = await Promise.all([
    dataSource.getRepository(UserEntity).count(),
    dataSource.getRepository(PartEntity).count(),
  ])
  if (userCount > 0 || partCount > 0) return false
  const parts = readDemoParts(demoDir)
  await dataSource.transaction(async (manager) => {
    await insertParts(manager, parts)
  })
  for (const user of DEMO_USERS) await users.create({ ...user, password: DEMO_PASSWORD })
  return true
}
