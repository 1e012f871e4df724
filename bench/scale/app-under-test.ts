/*
 * The only file of the scale benchmark that knows the server's insides: how
 * to build and start the app. The server is being reorganised; adapt this
 * file and the rest of the benchmark keeps driving the app over HTTP.
 */
import 'reflect-metadata'
import type { AddressInfo } from 'node:net'
import path from 'node:path'
import { createApp } from '../../server/app'
import { prepareDatabase } from '../../server/bootstrap'
import { loadConfig } from '../../server/config/env'
import { DEMO_PASSWORD } from '../../server/demo/seed'

export type AppUnderTest = {
  url: string
  dbPath: string
  password: string
  close: () => Promise<void>
}

/** The app on a fresh SQLite file in `dir`, seeded with the demo accounts, listening on a free local port. */
export async function startAppUnderTest(dir: string, env: Record<string, string>): Promise<AppUnderTest> {
  const dbPath = path.join(dir, 'bench.sqlite')
  const config = loadConfig({ NODE_ENV: 'test', FITWRIGHT_DB_PATH: dbPath, FITWRIGHT_DEMO: '1', ...env })
  const { dataSource, services } = await prepareDatabase(config)
  const app = await createApp({ config, dataSource, services, version: 'bench' })
  const server = app.listen(0, '127.0.0.1')
  // The bench's synchronous baselines hold this shared event loop for seconds; with Node's 5 s
  // idle-socket timeout the server would close a kept-alive socket just as the next request reuses it.
  server.keepAliveTimeout = 10 * 60_000
  await new Promise<void>((resolve, reject) => server.once('listening', resolve).once('error', reject))
  const { port } = server.address() as AddressInfo
  return {
    url: `http://127.0.0.1:${port}`,
    dbPath,
    password: DEMO_PASSWORD,
    async close() {
      server.closeAllConnections()
      await new Promise<void>((resolve) => server.close(() => resolve()))
      await services.imports.close()
      await dataSource.destroy()
    },
  }
}
