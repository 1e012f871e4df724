import type { DataSource } from 'typeorm'
import type { AppConfig } from '../config/env'
import { PartService } from './part.service'
import { UserService } from './user.service'

/** Every service, built once per app around one data source. */
export function createServices(dataSource: DataSource, _config: AppConfig) {
  return {
    users: new UserService(dataSource),
    parts: new PartService(dataSource),
  }
}
export type Services = ReturnType<typeof createServices>
