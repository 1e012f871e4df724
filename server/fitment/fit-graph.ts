import type { DataSource } from 'typeorm'
import type { LinkSource, Relation, ReviewStatus } from '../../shared/schemas/fitment'
import type { PartKind } from '../../shared/schemas/part-kinds'
import { pushTo } from '../lib/map-list'

export type GraphPart = { id: number; partNumber: string; kind: PartKind; name: string; family: string }
export type GraphLink = {
  id: number
  a: number
  b: number
  relation: Relation
  status: ReviewStatus
  source: LinkSource
  note: string
  modifications: string[]
}
export type GraphIdentity = { id: number; a: number; b: number; note: string; source: LinkSource }

/**
 * The whole fitment graph in memory: parts (light), links and identity classes.
 * Traversals run on plain adjacency lists, which is orders of magnitude faster
 * than a general graph library on a catalogue of this size.
 */
export class FitGraph {
  readonly parts = new Map<number, GraphPart>()
  readonly byNumber = new Map<string, number>()
  private readonly linksByPart = new Map<number, GraphLink[]>()
  private readonly identitiesByPart = new Map<number, GraphIdentity[]>()
  private readonly classes = new Map<number, number[]>()

  constructor(parts: GraphPart[], links: GraphLink[], identities: GraphIdentity[]) {
    for (const part of parts) {
      this.parts.set(part.id, part)
      this.byNumber.set(part.partNumber, part.id)
    }
    for (const link of links) {
      pushTo(this.linksByPart, link.a, link)
      pushTo(this.linksByPart, link.b, link)
    }
    for (const identity of identities) {
      pushTo(this.identitiesByPart, identity.a, identity)
      pushTo(this.identitiesByPart, identity.b, identity)
    }
    this.buildClasses(identities)
  }

  /** Identity is transitive: union-find over the identity pairs. */
  private buildClasses(identities: GraphIdentity[]) {
    const parent = new Map<number, number>()
    const find = (x: number): number => {
      let root = x
      while (parent.has(root) && parent.get(root) !== root) root = parent.get(root)!
      let node = x
      while (node !== root) {
        const next = parent.get(node)!
        parent.set(node, root)
        node = next
      }
      return root
    }
    for (const { a, b } of identities) {
      if (!parent.has(a)) parent.set(a, a)
      if (!parent.has(b)) parent.set(b, b)
      const ra = find(a)
      const rb = find(b)
      if (ra !== rb) parent.set(Math.max(ra, rb), Math.min(ra, rb))
    }
    const members = new Map<number, number[]>()
    for (const id of parent.keys()) pushTo(members, find(id), id)
    for (const list of members.values()) {
      list.sort((x, y) => x - y)
      for (const id of list) this.classes.set(id, list)
    }
  }

  part(id: number): GraphPart {
    const part = this.parts.get(id)
    if (!part) throw new Error(`Part ${id} is not in the graph`)
    return part
  }

  /** The part and every part identical to it, lowest id first. */
  classOf(id: number): number[] {
    return this.classes.get(id) ?? [id]
  }

  linksOf(id: number): GraphLink[] {
    return this.linksByPart.get(id) ?? []
  }

  identitiesOf(id: number): GraphIdentity[] {
    return this.identitiesByPart.get(id) ?? []
  }

  /** Shortest chain of identity declarations between two identical parts. */
  identityChain(from: number, to: number): GraphIdentity[] {
    if (from === to) return []
    const previous = new Map<number, GraphIdentity>()
    const queue = [from]
    const seen = new Set([from])
    while (queue.length) {
      const current = queue.shift()!
      for (const identity of this.identitiesOf(current)) {
        const next = identity.a === current ? identity.b : identity.a
        if (seen.has(next)) continue
        seen.add(next)
        previous.set(next, identity)
        if (next === to) {
          const chain: GraphIdentity[] = []
          let node = to
          while (node !== from) {
            const step = previous.get(node)!
            chain.unshift(step)
            node = step.a === node ? step.b : step.a
          }
          return chain
        }
        queue.push(next)
      }
    }
    return []
  }

  /**
   * The reviewed link that decides a pair, looking through identical parts:
   * a direct link first, then any link between members of the two classes.
   */
  linkBetween(a: number, b: number, statuses: ReviewStatus[] = ['approved']): { link: GraphLink; viaA: number; viaB: number } | null {
    const classB = new Set(this.classOf(b))
    let best: { link: GraphLink; viaA: number; viaB: number; cost: number } | null = null
    for (const member of this.classOf(a)) {
      for (const link of this.linksOf(member)) {
        if (!statuses.includes(link.status)) continue
        const other = link.a === member ? link.b : link.a
        if (!classB.has(other)) continue
        const cost = (member === a ? 0 : 1) + (other === b ? 0 : 1)
        if (!best || cost < best.cost || (cost === best.cost && link.id < best.link.id)) {
          best = { link, viaA: member, viaB: other, cost }
        }
      }
    }
    return best ? { link: best.link, viaA: best.viaA, viaB: best.viaB } : null
  }
}

/**
 * What a committed write touched, by row id. Writers hand it to the graph
 * index right after the commit; the index reloads those rows and applies them.
 */
export type CatalogueChanges = { parts?: number[]; links?: number[]; identities?: number[] }

/**
 * Keeps one FitGraph up to date with the catalogue. Every writer of parts,
 * links or identities calls applyChanges() after its commit.
 */
export class FitGraphIndex {
  private current: Promise<FitGraph> | null = null

  constructor(private readonly dataSource: DataSource) {}

  /** Takes a committed change into the graph (for now by rebuilding it at the next read). */
  async applyChanges(_changes: CatalogueChanges): Promise<void> {
    this.current = null
  }

  /** Throws the whole graph away: only for writes that cannot say what they touched. */
  invalidate() {
    this.current = null
  }

  snapshot(): Promise<FitGraph> {
    if (!this.current) {
      const loading = this.load()
      this.current = loading
      loading.catch(() => {
        if (this.current === loading) this.current = null
      })
    }
    return this.current
  }

  private async load(): Promise<FitGraph> {
    const [parts, links, mods, identities] = await Promise.all([
      this.dataSource.query('SELECT id, partNumber, kind, name, family FROM part') as Promise<GraphPart[]>,
      this.dataSource.query('SELECT id, partAId AS a, partBId AS b, relation, status, source, note FROM link') as Promise<
        Omit<GraphLink, 'modifications'>[]
      >,
      this.dataSource.query(
        'SELECT lm.linkId AS linkId, m.name AS name FROM link_modification lm JOIN modification m ON m.id = lm.modificationId ORDER BY m.name',
      ) as Promise<{ linkId: number; name: string }[]>,
      this.dataSource.query('SELECT id, partAId AS a, partBId AS b, note, source FROM part_identity') as Promise<
        GraphIdentity[]
      >,
    ])
    const modsByLink = new Map<number, string[]>()
    for (const { linkId, name } of mods) pushTo(modsByLink, linkId, name)
    return new FitGraph(
      parts,
      links.map((link) => ({ ...link, modifications: modsByLink.get(link.id) ?? [] })),
      identities,
    )
  }
}
