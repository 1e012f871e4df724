import pg from 'pg'

/** Row ids a committed change touched, as the graph index takes them. */
export type TouchedIds = { parts?: number[]; links?: number[]; identities?: number[]; stockParts?: number[]; sites?: number[] }

const KEYS = ['parts', 'links', 'identities', 'stockParts', 'sites'] as const

type ChangeRow = { id: number; touched: TouchedIds }

const CHANNEL = 'fitwright_catalogue'
/** A missed notification (a dropped connection) is caught up by polling this often. */
const POLL_MS = 5_000
/**
 * Changes are kept this long, then removed: every server reads them within
 * seconds, and one that starts reads the whole catalogue, not the feed.
 */
export const CHANGE_KEPT_MS = 24 * 60 * 60_000
const PRUNE_MS = 60 * 60_000

/** Removes changes older than `keptMs`; any server may do it, and each does on its own beat. */
export async function pruneCatalogueChanges(client: Pick<pg.ClientBase, 'query'>, keptMs = CHANGE_KEPT_MS): Promise<number> {
  const result = await client.query(
    `DELETE FROM catalogue_change WHERE "createdAt" < (now() AT TIME ZONE 'utc') - make_interval(secs => $1)`,
    [keptMs / 1000],
  )
  return result.rowCount ?? 0
}

function merge(rows: ChangeRow[]): TouchedIds {
  const merged = new Map(KEYS.map((key) => [key, new Set<number>()]))
  for (const { touched } of rows) for (const key of KEYS) for (const id of touched[key] ?? []) merged.get(key)!.add(id)
  return Object.fromEntries(KEYS.map((key) => [key, [...merged.get(key)!]])) as TouchedIds
}

/**
 * Follows the catalogue_change feed that PostgreSQL triggers fill (see the
 * CatalogueChangeFeed migration): on each notification, and every few
 * seconds in case one was missed, reads the changes after the last one seen
 * and hands their ids to `apply`, in order and one batch at a time.
 */
export async function listenForCatalogueChanges(
  url: string,
  apply: (touched: TouchedIds) => Promise<void>,
  onError: (error: unknown) => void = (error) => console.error('Catalogue change feed:', error),
): Promise<{ close: () => Promise<void> }> {
  const client = new pg.Client({ connectionString: url })
  await client.connect()
  const start = await client.query<{ last: number | null }>('SELECT MAX("id") AS "last" FROM catalogue_change')
  let lastSeen = Number(start.rows[0]?.last ?? 0)
  let running: Promise<void> = Promise.resolve()
  let closed = false

  const catchUp = () => {
    running = running.then(async () => {
      if (closed) return
      try {
        const { rows } = await client.query<ChangeRow>(
          'SELECT "id", "touched" FROM catalogue_change WHERE "id" > $1 ORDER BY "id" LIMIT 1000',
          [lastSeen],
        )
        if (rows.length === 0) return
        lastSeen = Number(rows[rows.length - 1]!.id)
        await apply(merge(rows))
        if (rows.length === 1000) catchUp()
      } catch (error) {
        onError(error)
      }
    })
    return running
  }

  client.on('notification', () => void catchUp())
  client.on('error', onError)
  await client.query(`LISTEN ${CHANNEL}`)
  const timer = setInterval(() => void catchUp(), POLL_MS)
  timer.unref()
  const pruning = setInterval(() => {
    running = running.then(() => pruneCatalogueChanges(client).then(() => undefined, onError))
  }, PRUNE_MS)
  pruning.unref()

  return {
    async close() {
      closed = true
      clearInterval(timer)
      clearInterval(pruning)
      await running
      await client.end()
    },
  }
}
