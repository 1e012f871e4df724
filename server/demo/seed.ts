import { readdirSync, readFileSync, statSync } from 'node:fs'
import path from 'node:path'
import type { DataSource, EntityManager } from 'typeorm'
import { z } from 'zod'
import type { Role } from '../../shared/schemas/auth'
import { buildSheetInputSchema } from '../../shared/schemas/build'
import { linkSourceSchema, relationSchema, type ReviewStatus } from '../../shared/schemas/fitment'
import type { ImportType } from '../../shared/schemas/imports'
import { splitList } from '../csv/part-row'
import { readCsvText } from '../csv/read-csv'
import { BuildSheetEntity } from '../entities/build-sheet.entity'
import { PartEntity } from '../entities/part.entity'
import { UserEntity } from '../entities/user.entity'
import { AppError } from '../errors/app-error'
import { FitGraphIndex } from '../services/fit-graph'
import { ImportService, type ImportUser } from '../services/import.service'
import { insertLink } from '../services/link-writer'
import type { UserService } from '../services/user.service'

export const DEMO_PASSWORD = 'fitwright-demo'
export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@fitwright.test', name: 'Ines Marlow', role: 'admin' },
  { email: 'editor@fitwright.test', name: 'Tobias Ferrand', role: 'editor' },
  { email: 'counter@fitwright.test', name: 'Rosa Quint', role: 'counter' },
  { email: 'tech@fitwright.test', name: 'Dario Lenk', role: 'tech' },
]

/**
 * The demo catalogue goes in the way an editor's would: each parts file, then
 * the links file, as an import batch (so a fresh demo has batches to show and
 * revert). A rejected row is a bug in the scenario.
 */
async function importDemoFile(imports: ImportService, demoDir: string, file: string, type: ImportType, user: ImportUser) {
  const filePath = path.join(demoDir, file)
  try {
    await imports.run({ filePath, fileName: `demo/${file}`, fileSize: statSync(filePath).size, type, mode: 'commit', validRowsOnly: false, user })
  } catch (error) {
    if (!(error instanceof AppError)) throw error
    const details = (error.details ?? []).map((detail) => `${detail.path}: ${detail.message}`).join('; ')
    throw new Error(`Demo data ${file}: ${error.message} ${details}`)
  }
}

/** Links still awaiting review, which an import cannot make (it approves what it writes). */
async function seedProposedLinks(manager: EntityManager, file: string, status: ReviewStatus) {
  const parts = (await manager.query('SELECT id, partNumber FROM part')) as { id: number; partNumber: string }[]
  const ids = new Map(parts.map((part) => [part.partNumber, part.id]))
  const rows = readCsvText(readFileSync(file, 'utf8')).rows
  for (const [index, row] of rows.entries()) {
    const a = ids.get(row.from_part ?? '')
    const b = ids.get(row.to_part ?? '')
    if (a === undefined || b === undefined) throw new Error(`Demo data ${path.basename(file)} row ${index + 2}: unknown part`)
    await insertLink(manager, {
      partIds: [a, b],
      relation: relationSchema.parse(row.relation),
      modifications: splitList(row.modifications),
      note: row.note ?? '',
      source: linkSourceSchema.parse(row.source),
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
  const created = []
  for (const user of DEMO_USERS) created.push(await users.create({ ...user, password: DEMO_PASSWORD }))
  const editor = created.find((user) => user.role === 'editor')!
  const tech = created.find((user) => user.role === 'tech')!
  const imports = new ImportService(dataSource, { maxRows: Number.MAX_SAFE_INTEGER }, new FitGraphIndex(dataSource))
  const partFiles = readdirSync(path.join(demoDir, 'parts')).filter((file) => file.endsWith('.csv')).sort()
  for (const file of partFiles) await importDemoFile(imports, demoDir, `parts/${file}`, 'parts', editor)
  await importDemoFile(imports, demoDir, 'links.csv', 'links', editor)
  await dataSource.transaction(async (manager) => {
    await seedProposedLinks(manager, path.join(demoDir, 'proposed-links.csv'), 'proposed')
    await seedBuilds(manager, path.join(demoDir, 'builds.json'), tech.id)
  })
  return true
}
