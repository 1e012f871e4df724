import { siteInputSchema, stockInputSchema } from '../../shared/schemas/stock'
import { vehicleInputSchema } from '../../shared/schemas/vehicles'
import { readdirSync, readFileSync, statSync } from 'node:fs'
import path from 'node:path'
import type { Database as Port } from '../db/database'
import type { DataSource } from 'typeorm'
import { z } from 'zod'
import type { Role, User } from '../../shared/schemas/auth'
import { buildSheetInputSchema } from '../../shared/schemas/build'
import { linkSourceSchema, relationSchema } from '../../shared/schemas/fitment'
import type { ImportType } from '../../shared/schemas/imports'
import { splitList } from '../imports/csv/part-row'
import { readCsvText } from '../imports/csv/read-csv'
import { AppSettingEntity } from '../settings/app-setting.entity'
import { databaseOf } from '../db/sqlite-connection'
import { PartEntity } from '../catalogue/part.entity'
import { UserEntity } from '../users/user.entity'
import { AppError } from '../errors/app-error'
import type { ImportService, ImportUser } from '../imports/import.service'
import { insertLinkRow } from '../fitment/link-rows'
import type { Services } from '../services'

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
    await imports.run({
      filePath,
      fileName: `demo/${file}`,
      fileSize: statSync(filePath).size,
      type,
      mode: 'commit',
      validRowsOnly: false,
      user,
    })
  } catch (error) {
    if (!(error instanceof AppError)) throw error
    const details = (error.details ?? []).map((detail) => `${detail.path}: ${detail.message}`).join('; ')
    throw new Error(`Demo data ${file}: ${error.message} ${details}`, { cause: error })
  }
}

/** Links still awaiting review, which an import cannot make (it approves what it writes). */
async function seedProposedLinks(db: Port, file: string) {
  const rows = readCsvText(readFileSync(file, 'utf8')).rows
  for (const [index, row] of rows.entries()) {
    const idOf = async (number: string | undefined) =>
      (await db.get<{ id: number }>('SELECT "id" FROM part WHERE "partNumber" = ?', [number ?? '']))?.id
    const a = await idOf(row.from_part)
    const b = await idOf(row.to_part)
    if (a === undefined || b === undefined) throw new Error(`Demo data ${path.basename(file)} row ${index + 2}: unknown part`)
    await insertLinkRow(db, {
      partIds: [Number(a), Number(b)],
      relation: relationSchema.parse(row.relation),
      modifications: splitList(row.modifications),
      note: row.note ?? '',
      source: linkSourceSchema.parse(row.source),
      status: 'proposed',
      batchId: null,
    })
  }
}

const demoBuildsSchema = z.array(buildSheetInputSchema)

/** The demo sheets go through the sheet service, so each is judged as a saved sheet is and the list shows its verdict and labour. */
async function seedBuilds(sheets: Services['sheets'], file: string, owner: User) {
  for (const build of demoBuildsSchema.parse(JSON.parse(readFileSync(file, 'utf8')))) await sheets.create(build, owner)
}

const SEEDED_KEY = 'demo-seeded'

/** The demo sites and units on their shelves: every condition and status appears. */
async function seedStock(stock: Services['stock'], file: string) {
  const demo = JSON.parse(readFileSync(file, 'utf8')) as { sites: unknown[]; units: unknown[] }
  for (const site of demo.sites) await stock.createSite(siteInputSchema.parse(site))
  for (const unit of demo.units) await stock.create(stockInputSchema.parse(unit))
}

/**
 * Whether the demo scenario should be seeded: the database is empty (no users,
 * no parts) and was never seeded. A seed cut short is reported instead.
 */
export async function demoSeedDue(dataSource: DataSource, users: Services['users']): Promise<boolean> {
  const settings = dataSource.getRepository(AppSettingEntity)
  if (await settings.existsBy({ key: SEEDED_KEY })) return false
  const [userCount, partCount] = await Promise.all([
    dataSource.getRepository(UserEntity).count(),
    dataSource.getRepository(PartEntity).count(),
  ])
  if (userCount === 0 && partCount === 0) return true
  const [{ sheets }] = (await dataSource.query('SELECT CAST(COUNT(*) AS INTEGER) AS sheets FROM build_sheet')) as [{ sheets: number }]
  if (
    sheets === 0 &&
    (
      await users.withPassword(
        DEMO_USERS.map((u) => u.email),
        DEMO_PASSWORD,
      )
    ).length > 0
  ) {
    console.warn('WARNING: the demo scenario looks only partly seeded (a start was cut short). Delete the database file to seed it again.')
  }
  return false
}

/**
 * Seeds the invented demo scenario into an empty database (no users, no parts)
 * and marks it done. A seed cut short (a bad demo row, a killed process) is
 * reported at the next start rather than silently left half-filled.
 * Returns whether it seeded.
 */
export async function seedDemo(
  dataSource: DataSource,
  services: Pick<Services, 'users' | 'imports' | 'graphIndex' | 'stock' | 'vehicles' | 'sheets'>,
  demoDir: string,
): Promise<boolean> {
  const { users, imports } = services
  if (!(await demoSeedDue(dataSource, users))) return false
  const created = []
  for (const user of DEMO_USERS) created.push(await users.createDemo({ ...user, password: DEMO_PASSWORD }))
  const editor = created.find((user) => user.role === 'editor')!
  const tech = created.find((user) => user.role === 'tech')!
  const partFiles = readdirSync(path.join(demoDir, 'parts'))
    .filter((file) => file.endsWith('.csv'))
    .sort()
  for (const file of partFiles) await importDemoFile(imports, demoDir, `parts/${file}`, 'parts', editor)
  await importDemoFile(imports, demoDir, 'links.csv', 'links', editor)
  await seedStock(services.stock, path.join(demoDir, 'stock.json'))
  for (const vehicle of JSON.parse(readFileSync(path.join(demoDir, 'vehicles.json'), 'utf8')) as unknown[]) {
    await services.vehicles.create(vehicleInputSchema.parse(vehicle))
  }
  await databaseOf(dataSource).transaction((db) => seedProposedLinks(db, path.join(demoDir, 'proposed-links.csv')))
  services.graphIndex.invalidate()
  await seedBuilds(services.sheets, path.join(demoDir, 'builds.json'), tech)
  // Written last: a start cut short before here is reported at the next start.
  await dataSource.getRepository(AppSettingEntity).insert({ key: SEEDED_KEY, value: new Date().toISOString() })
  return true
}
