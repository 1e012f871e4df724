import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import type { Express } from 'express'
import request from 'supertest'
import type { DataSource } from 'typeorm'
import { createApp } from '../../server/app'
import { prepareDatabase } from '../../server/bootstrap'
import { loadConfig, type AppConfig } from '../../server/config/env'
import { DEMO_PASSWORD } from '../../server/demo/seed'
import type { Role } from '../../shared/schemas/auth'

export type TestApp = {
  app: Express
  dataSource: DataSource
  config: AppConfig
  /** A supertest agent signed in as the demo user of that role. */
  signIn: (role: Role) => Promise<ReturnType<typeof request.agent>>
  close: () => Promise<void>
}

/** A fresh app on its own temporary SQLite file, seeded with the demo scenario unless told not to. */
export async function createTestApp(options: { demo?: boolean; env?: Record<string, string> } = {}): Promise<TestApp> {
  const dir = mkdtempSync(path.join(tmpdir(), 'fitwright-test-'))
  const config = loadConfig({
    NODE_ENV: 'test',
    FITWRIGHT_DB_PATH: path.join(dir, 'test.sqlite'),
    FITWRIGHT_DEMO: options.demo === false ? '0' : '1',
    ...options.env,
  })
  const { dataSource, rules } = await prepareDatabase(config)
  const app = await createApp({ config, dataSource, rules, version: 'test' })
  return {
    app,
    dataSource,
    config,
    async signIn(role) {
      const agent = request.agent(app)
      const response = await agent.post('/api/auth/login').send({ email: `${role}@fitwright.test`, password: DEMO_PASSWORD })
      if (response.status !== 200) throw new Error(`Sign-in as ${role} failed: ${response.status}`)
      return agent
    },
    async close() {
      await dataSource.destroy()
      rmSync(dir, { recursive: true, force: true })
    },
  }
}
