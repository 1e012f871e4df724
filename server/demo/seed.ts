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
import { insertIdentity, insertLink } from '../services/link-writer'
import { splitList } from '../csv/part-row'
import { buildSheetInputSchema } from '../../shared/schemas/build'
import { linkSourceSchema, relationSchema, type ReviewStatus } from '../../shared/schemas/fitment'
import { BuildSheetEntity } from '../entities/build-sheet.entity'
import type { EntityManager } from 'typeorm'
import { z } from 'zod'
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

/** Demo links and identities, in the links file format; a bad row is a bug in the scenario. */
async function seedLinks(manager: EntityManager, ids: Map<string, number>, file: string, status: ReviewStatus) {
  const rows = readCsvText(readFileSync(file, 'utf8')).rows
  for (const [index, row] of rows.entries()) {
    const where = `${path.basename(file)} row ${index + 2}`
    const a = ids.get(row.from_part ?? '')
    const b = ids.get(row.to_part ?? '')
    if (a === undefined || b === undefined) throw new Error(`Demo data ${where}: unknown part`)
    const source = linkSourceSchema.parse(row.source)
    if (row.relation === 'identical') {
      await insertIdentity(manager, { partIds: [a, b], note: row.note ?? '', source })
      continue
    }
    await insertLink(manager, {
      partIds: [a, b],
      relation: relationSchema.parse(row.relation),
      modifications: splitList(row.modifications),
      note: row.note ?? '',
      source,
      status,
    })
  }
}

const demoBuildsSchema = z.array(buildSheetInputSchema)

async function seedBuilds(manager: EntityManager, file: string, ownerId: number) {
  const builds = demoBuildsSchema.parse(JSON.parse(readFileSync(file, 'utf8')))
  for (const build of builds) {
    await manager.insert(BuildSheetEntity, {
      ownerId,
      name: build.name,
      notes: build.notes,
      slots: build.slots as Record<string, string>,
      targetPowerKw: build.targetPowerKw ?? null,
      fuelOctane: build.fuelOctane ?? null,
      chassisModelYear: build.chassisModelYear ?? null,
      vin: build.vin ?? null,
    })
  }
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
  const created = []
  for (const user of DEMO_USERS) created.push(await users.create({ ...user, password: DEMO_PASSWORD }))
  const tech = created.find((user) => user.role === 'tech')!
  await dataSource.transaction(async (manager) => {
    const ids = await insertParts(manager, parts)
    await seedLinks(manager, ids, path.join(demoDir, 'links.csv'), 'approved')
    await seedLinks(manager, ids, path.join(demoDir, 'proposed-links.csv'), 'proposed')
    await seedBuilds(manager, path.join(demoDir, 'builds.json'), tech.id)
  })
  return true
}
