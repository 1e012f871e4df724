import Database from 'better-sqlite3'
import { MAX_NEIGHBOURHOOD_EDGES, MAX_NEIGHBOURHOOD_NODES } from '../../shared/schemas/graph'

/*
 * The baselines: each answer's data as one or a few indexed better-sqlite3
 * queries on the app's own database file, read-only. Real table and column
 * names; nothing of the server's code.
 */
type Row = Record<string, unknown>
type LinkEnd = { id: number; partAId: number; partBId: number }

export class BareQueries {
  private readonly names = new Database(':memory:')
  private readonly statements
  private readonly nameMatch: Database.Statement

  constructor(readonly db: Database.Database) {
    const partColumns = 'p.id, p.partNumber, p.kind, p.name, p.family'
    const linkEnds =
      'SELECT id, partAId, partBId FROM link WHERE partAId = ? UNION ALL SELECT id, partAId, partBId FROM link WHERE partBId = ?'
    this.statements = {
      byKeyPrefix: db.prepare(`SELECT ${partColumns} FROM part p WHERE p.partKey >= ? AND p.partKey < ? ORDER BY p.partKey LIMIT 25`),
      byMarkPrefix: db.prepare(
        `SELECT ${partColumns} FROM part_mark m JOIN part p ON p.id = m.partId WHERE m.valueKey >= ? AND m.valueKey < ? LIMIT 25`,
      ),
      byIds: db.prepare(`SELECT ${partColumns} FROM part p WHERE p.id IN (SELECT value FROM json_each(?))`),
      linksBothWays: db.prepare(
        `SELECT l.id, l.relation, l.status, ${partColumns} FROM link l JOIN part p ON p.id = l.partBId WHERE l.partAId = ?
         UNION ALL SELECT l.id, l.relation, l.status, ${partColumns} FROM link l JOIN part p ON p.id = l.partAId WHERE l.partBId = ?`,
      ),
      linkEnds: db.prepare(`${linkEnds} LIMIT ?`),
      partByNumber: db.prepare('SELECT * FROM part WHERE partNumber = ?'),
      pairLink: db.prepare('SELECT id, relation, status FROM link WHERE partAId = ? AND partBId = ?'),
      kindCandidates: db.prepare('SELECT id, attributes FROM part WHERE kind = ?'),
    }
    this.names.exec('CREATE VIRTUAL TABLE part_name USING fts5(name)')
    const insert = this.names.prepare('INSERT INTO part_name (rowid, name) VALUES (?, ?)')
    const rows = db.prepare('SELECT id, name FROM part').raw().all() as [number, string][]
    this.names.transaction(() => rows.forEach(([id, name]) => insert.run(id, name)))()
    this.nameMatch = this.names.prepare('SELECT rowid FROM part_name WHERE part_name MATCH ? LIMIT 25').pluck()
  }

  /** Keys are upper-case letters and digits, so this bound closes every prefix range. */
  private static range = (key: string) => [key, `${key}\u007f`]

  partId(partNumber: string): number {
    return (this.statements.partByNumber.get(partNumber) as { id: number }).id
  }

  searchNumberPrefix(key: string): Row[] {
    return this.statements.byKeyPrefix.all(...BareQueries.range(key)) as Row[]
  }

  searchMarkPrefix(key: string): Row[] {
    return this.statements.byMarkPrefix.all(...BareQueries.range(key)) as Row[]
  }

  /** A name word through an FTS5 index of the names (built once, outside the timings). */
  searchNameWord(word: string): Row[] {
    const ids = this.nameMatch.all(`"${word}"`)
    return this.statements.byIds.all(JSON.stringify(ids)) as Row[]
  }

  linksBothWays(partId: number): Row[] {
    return this.statements.linksBothWays.all(partId, partId) as Row[]
  }

  /** Two steps out by index, taking links in order until the app's caps on parts or links are reached. */
  neighbourhood(centre: number): { nodes: Row[]; edges: number } {
    const nodes = new Set([centre])
    const full = () => edges >= MAX_NEIGHBOURHOOD_EDGES || nodes.size >= MAX_NEIGHBOURHOOD_NODES
    let frontier = [centre]
    let edges = 0
    for (let depth = 1; depth <= 2 && !full(); depth++) {
      const next: number[] = []
      for (const node of frontier) {
        for (const link of this.statements.linkEnds.iterate(node, node, MAX_NEIGHBOURHOOD_EDGES - edges) as Iterable<LinkEnd>) {
          const other = link.partAId === node ? link.partBId : link.partAId
          edges++
          if (!nodes.has(other)) {
            nodes.add(other)
            next.push(other)
          }
          if (full()) break
        }
        if (full()) break
      }
      frontier = next
    }
    return { nodes: this.statements.byIds.all(JSON.stringify([...nodes])) as Row[], edges }
  }

  /** A build's parts by number and the link of every pair of them by the pair index. */
  buildPairs(partNumbers: string[]): number {
    const ids = partNumbers.map((number) => this.partId(number))
    let found = 0
    for (let i = 0; i < ids.length; i++) {
      for (let j = i + 1; j < ids.length; j++) {
        if (this.statements.pairLink.get(Math.min(ids[i]!, ids[j]!), Math.max(ids[i]!, ids[j]!))) found++
      }
    }
    return found
  }

  /** What a completion has to read: every candidate of the empty slots' kinds with its attributes, and the chosen parts' links. */
  completionReads(filled: number[], emptyKinds: string[]): number {
    let read = 0
    for (const kind of emptyKinds) {
      for (const row of this.statements.kindCandidates.iterate(kind) as Iterable<{ attributes: string }>)
        read += Object.keys(JSON.parse(row.attributes) as object).length > 0 ? 1 : 0
    }
    for (const id of filled) read += this.linksBothWays(id).length
    return read
  }

  close() {
    this.names.close()
  }
}
