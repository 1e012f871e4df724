import { setImmediate as nextTurn } from 'node:timers/promises'
import type { DataSource } from 'typeorm'
import { databaseOf } from '../../db/sqlite-connection'
import { LinkRepository } from '../link.repository'
import { FitGraph } from './fit-graph'

/**
 * What a committed write touched, by row id. Writers hand it to the graph
 * index right after the commit; the index reloads those rows and applies them.
 */
export type CatalogueChanges = { parts?: number[]; links?: number[]; identities?: number[] }

/** Rows read per statement while loading, and ids applied between two turns of the event loop. */
const LOAD_PAGE = 20_000
const APPLY_CHUNK = 5_000

/**
 * Keeps one FitGraph up to date with the catalogue: loaded once at start-up
 * (a page of rows at a time, yielding between pages), then every committed
 * write is applied as a delta by the rows it touched.
 */
export class FitGraphIndex {
  readonly repository: LinkRepository
  /** Whole loads so far (start-up, and reloads asked for by invalidate()). */
  loads = 0
  private graph: FitGraph | null = null
  private loading: Promise<FitGraph> | null = null
  private work: Promise<unknown> = Promise.resolve()
  /** Changes applied while a background reload runs, to apply again to the new graph. */
  private replay: CatalogueChanges[] | null = null
  private reloading: Promise<void> | null = null

  constructor(dataSource: DataSource) {
    this.repository = new LinkRepository(databaseOf(dataSource))
  }

  /** Loads the graph (once; later calls wait for the same load). */
  load(): Promise<FitGraph> {
    if (this.graph) return Promise.resolve(this.graph)
    if (!this.loading) {
      const loading = this.readAll().then((graph) => (this.graph = graph))
      loading
        .catch(() => undefined)
        .finally(() => {
          if (this.loading === loading) this.loading = null
        })
      this.loading = loading
    }
    return this.loading
  }

  /** The live graph (loaded if start-up did not): deltas land in it, so the next answer sees them. */
  snapshot(): Promise<FitGraph> {
    return this.load()
  }

  /** Reads the rows a write touched and applies them; a row that is gone was removed. */
  applyChanges(changes: CatalogueChanges): Promise<void> {
    const run = this.work.then(async () => {
      // A load in progress may have read these rows before the commit: apply them after it.
      if (!this.graph && this.loading) await this.loading.catch(() => undefined)
      if (!this.graph) return
      this.replay?.push(changes)
      await this.applyTo(this.graph, changes)
    })
    this.work = run.catch(() => undefined)
    return run
  }

  /**
   * For a write that cannot say what it touched: reloads in the background, a
   * page at a time, while the current graph keeps answering; changes applied
   * meanwhile are applied again to the new graph before it takes over. The
   * promise settles when it has (await it where the next answer must show the write).
   */
  invalidate(): Promise<void> {
    if (!this.graph) return Promise.resolve()
    if (this.reloading) return this.reloading
    const replay: CatalogueChanges[] = []
    this.replay = replay
    this.reloading = this.readAll()
      .then(async (fresh) => {
        for (const changes of replay) await this.applyTo(fresh, changes)
        this.graph = fresh
      })
      .catch((error: unknown) => console.error('Reloading the fit graph failed; the previous graph keeps answering.', error))
      .finally(() => {
        this.replay = null
        this.reloading = null
      })
    return this.reloading
  }

  /** Waits for writes already handed in (and a background reload) to land: for tests and shutdown. */
  async settled(): Promise<void> {
    await this.work
    await this.reloading
  }

  private async readAll(): Promise<FitGraph> {
    this.loads++
    const graph = new FitGraph(this.repository)
    const repo = this.repository
    for (let after = 0; ;) {
      const rows = await repo.partPage(after, LOAD_PAGE)
      for (const row of rows) graph.setPart(row.id, row.partNumber, row.kind, row.attributes, row.yearTo)
      if (rows.length < LOAD_PAGE) break
      after = rows[rows.length - 1]!.id
      await nextTurn()
    }
    for (let after = 0; ;) {
      const rows = await repo.linkPage(after, LOAD_PAGE)
      for (const row of rows) graph.setLink(row.id, row.a, row.b, row.relation, row.status)
      if (rows.length < LOAD_PAGE) break
      after = rows[rows.length - 1]!.id
      await nextTurn()
    }
    for (let after = 0; ;) {
      const rows = await repo.identityPage(after, LOAD_PAGE)
      for (const row of rows) graph.identities.add(row.id, row.a, row.b)
      if (rows.length < LOAD_PAGE) break
      after = rows[rows.length - 1]!.id
      await nextTurn()
    }
    graph.settle()
    return graph
  }

  /** Parts first (a new link may name a new part), then links and identities; big sets a chunk per turn. */
  private async applyTo(graph: FitGraph, changes: CatalogueChanges): Promise<void> {
    const repo = this.repository
    let first = true
    const pause = async () => {
      if (!first) await nextTurn()
      first = false
    }
    for (const ids of slices(changes.parts)) {
      await pause()
      const rows = new Map((await repo.partsById(ids)).map((row) => [row.id, row]))
      for (const id of ids) {
        const row = rows.get(id)
        if (row) graph.setPart(id, row.partNumber, row.kind, row.attributes, row.yearTo)
        else graph.removePart(id)
      }
    }
    for (const ids of slices(changes.links)) {
      await pause()
      const rows = new Map((await repo.linksById(ids)).map((row) => [row.id, row]))
      for (const id of ids) {
        const row = rows.get(id)
        if (row) graph.setLink(id, row.a, row.b, row.relation, row.status)
        else graph.removeLink(id)
      }
    }
    for (const ids of slices(changes.identities)) {
      await pause()
      const rows = new Map((await repo.identitiesById(ids)).map((row) => [row.id, row]))
      for (const id of ids) {
        const row = rows.get(id)
        if (row) graph.setIdentity(id, row.a, row.b)
        else graph.removeIdentity(id)
      }
    }
  }
}

function* slices(ids: number[] | undefined): Generator<number[]> {
  if (!ids) return
  const unique = [...new Set(ids)]
  for (let start = 0; start < unique.length; start += APPLY_CHUNK) yield unique.slice(start, start + APPLY_CHUNK)
}
