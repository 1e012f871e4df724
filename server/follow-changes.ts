import { listenForCatalogueChanges } from './db/postgres-change-listener'
import type { Services } from './services'

export type ChangeFollower = { close: () => Promise<void> }

/**
 * On PostgreSQL, other servers write to the same catalogue: their committed
 * changes reach this server's fit graph and stock index through the change
 * feed. This server's own writes come back too; applying them again reads the
 * same rows and changes nothing.
 */
export function followOtherServers(url: string, services: Pick<Services, 'graphIndex' | 'stockIndex'>): Promise<ChangeFollower> {
  return listenForCatalogueChanges(url, async ({ parts, links, identities, stockParts, sites }) => {
    if (parts?.length || links?.length || identities?.length) await services.graphIndex.applyChanges({ parts, links, identities })
    if (sites?.length) await services.stockIndex.refreshSites()
    if (stockParts?.length) await services.stockIndex.refresh(stockParts)
  })
}
