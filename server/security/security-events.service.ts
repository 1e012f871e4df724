import type { DataSource } from 'typeorm'
import { databaseOf } from '../db/sqlite-connection'
import type { SecurityEventPage, SecurityEventQuery } from '../../shared/schemas/security-events'
import { SecurityEventRepository, type NewSecurityEvent } from './security-event.repository'

/** The audit trail of security events an administrator reads. */
export class SecurityEventService {
  private readonly events: SecurityEventRepository

  constructor(dataSource: DataSource) {
    this.events = new SecurityEventRepository(databaseOf(dataSource))
  }

  async record(event: NewSecurityEvent): Promise<void> {
    await this.events.insert(event, new Date())
  }

  async page(query: SecurityEventQuery): Promise<SecurityEventPage> {
    const { events, total } = await this.events.page({
      kind: query.kind,
      limit: query.pageSize,
      offset: (query.page - 1) * query.pageSize,
    })
    return { events, total, page: query.page, pageSize: query.pageSize }
  }
}
