import 'reflect-metadata'
import path from 'node:path'
import { createApp } from './app'
import { demoAccountsLeft, prepareDatabase, projectRoot, readVersion } from './bootstrap'
import { loadConfig } from './config/env'

const config = loadConfig()
const { dataSource, services, seeded, changes } = await prepareDatabase(config)
const demoAccounts = await demoAccountsLeft(dataSource)
if (seeded) console.log('Seeded the demo scenario into the empty database.')
if (demoAccounts.length > 0) {
  console.warn(
    `WARNING: demo accounts with the published demo password are active (${demoAccounts.join(', ')}). ` +
      'They are for trying Fitwright only; remove them or change their passwords before real use.',
  )
}
const app = await createApp({
  config,
  dataSource,
  services,
  version: readVersion(),
  clientDir: config.env === 'production' ? path.join(projectRoot, 'dist') : undefined,
})
const server = app.listen(config.port, config.host, () => {
  const address = server.address()
  const port = typeof address === 'object' && address ? address.port : config.port
  const where = config.env === 'production' ? 'Fitwright is running' : 'Fitwright API is running (client: npm run dev)'
  console.log(`${where} at http://localhost:${port}/`)
})

// Mail goes out apart from requests; editors' digest of waiting reports is checked on the same beat.
services.outbox.start(5_000, async () => {
  await services.fieldReportNotices.digest()
  await services.stock.releaseExpired()
})

function shutdown() {
  server.close(() => {
    void services.accounts
      .resetsQueued()
      .then(() => services.outbox.stop())
      .then(() => changes?.close())
      .then(() => services.imports.close())
      .then(() => dataSource.destroy())
      .finally(() => process.exit(0))
  })
}
process.on('SIGINT', shutdown)
process.on('SIGTERM', shutdown)
