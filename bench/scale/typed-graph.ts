import type Database from 'better-sqlite3'

/**
 * The baseline for path answers: the fit links (approved, not does-not-fit)
 * and identities as a compressed adjacency list over part ids in Int32Arrays.
 */
export type TypedGraph = { offsets: Int32Array; targets: Int32Array; nodes: number; loadMs: number }

export function loadTypedGraph(db: Database.Database): TypedGraph {
  const started = performance.now()
  const nodes = ((db.prepare('SELECT MAX(id) FROM part').pluck().get() as number | null) ?? 0) + 1
  const edges = db
    .prepare(
      "SELECT partAId, partBId FROM link WHERE status = 'approved' AND relation <> 'does-not-fit' UNION ALL SELECT partAId, partBId FROM part_identity",
    )
    .raw()
  const ends: number[] = []
  for (const row of edges.iterate() as Iterable<[number, number]>) ends.push(row[0], row[1])
  const offsets = new Int32Array(nodes + 1)
  for (const end of ends) offsets[end + 1]!++
  for (let i = 0; i < nodes; i++) offsets[i + 1]! += offsets[i]!
  const fill = offsets.slice(0, nodes)
  const targets = new Int32Array(ends.length)
  for (let i = 0; i < ends.length; i += 2) {
    const a = ends[i]!
    const b = ends[i + 1]!
    targets[fill[a]!++] = b
    targets[fill[b]!++] = a
  }
  return { offsets, targets, nodes, loadMs: performance.now() - started }
}

/** Steps from one part to every part it reaches (-1 where it does not), by breadth-first search. */
export function distancesFrom(graph: TypedGraph, from: number, stopAt = -1): Int32Array {
  const distance = new Int32Array(graph.nodes).fill(-1)
  const queue = new Int32Array(graph.nodes)
  let head = 0
  let tail = 0
  distance[from] = 0
  queue[tail++] = from
  while (head < tail) {
    const node = queue[head++]!
    if (node === stopAt) break
    for (let i = graph.offsets[node]!; i < graph.offsets[node + 1]!; i++) {
      const next = graph.targets[i]!
      if (distance[next] !== -1) continue
      distance[next] = distance[node]! + 1
      queue[tail++] = next
    }
  }
  return distance
}

/** The farthest part `from` reaches and how many steps away it is. */
export function farthestFrom(graph: TypedGraph, from: number): { part: number; steps: number } {
  const distance = distancesFrom(graph, from)
  let part = from
  for (let i = 0; i < distance.length; i++) if (distance[i]! > distance[part]!) part = i
  return { part, steps: distance[part]! }
}
