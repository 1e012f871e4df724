import { PART_KINDS, type PartKind } from '../../../shared/schemas/part-kinds'
import { RELATIONS, REVIEW_STATUSES, type Relation, type ReviewStatus } from '../../../shared/schemas/fitment'
import { EdgeStore, resized } from './edge-store'
import { APPROVED, DOES_NOT_FIT, LinkStore, REJECTED, RELATION_CODE, STATUS_CODE } from './link-store'
import { AttributeClasses } from './attribute-classes'
import { IdentityClasses } from './identity-classes'
import type { FitDetails } from './fit-details'

/** What the graph holds of a part: enough to group and sort; the rest is read by id. */
export type GraphPart = { id: number; partNumber: string; kind: PartKind }
/** A link as the graph holds it; its note, source and modifications are read by id (FitDetails). */
export type GraphLink = { id: number; a: number; b: number; relation: Relation; status: ReviewStatus }
export type GraphIdentity = { id: number; a: number; b: number }

const KIND_CODE = new Map<string, number>(PART_KINDS.map((kind, index) => [kind, index]))
export { APPROVED, DOES_NOT_FIT, REJECTED }

/**
 * The fitment graph in memory, kept up to date by deltas (FitGraphIndex):
 * part numbers and kinds by part id, links and identities in typed arrays.
 */
export class FitGraph {
  readonly links = new LinkStore()
  readonly identities = new EdgeStore()
  readonly byNumber = new Map<string, number>()
  /** Parts by what the pair rules read of them, for inferring fits without reading the part table. */
  readonly ruleClasses = new AttributeClasses()
  private readonly classes = new IdentityClasses(this.identities)
  private partNumbers: (string | undefined)[] = []
  private kinds = new Uint8Array(16)
  private partTotal = 0
  /** Bumped whenever a part of the kind is added, changed or removed: caches over a kind's parts compare it. */
  private readonly kindRevisions = new Uint32Array(PART_KINDS.length)

  constructor(readonly details: FitDetails) {}

  get partCount(): number {
    return this.partTotal
  }

  /** One past the highest part id, for arrays indexed by part. */
  get partCapacity(): number {
    return this.partNumbers.length
  }

  hasPart(id: number): boolean {
    return this.partNumbers[id] !== undefined
  }

  part(id: number): GraphPart {
    const partNumber = this.partNumbers[id]
    if (partNumber === undefined) throw new Error(`Part ${id} is not in the graph`)
    return { id, partNumber, kind: PART_KINDS[this.kinds[id]!]! }
  }

  partNumberOf(id: number): string {
    return this.partNumbers[id] ?? `#${id}`
  }

  revisionOfKind(kind: PartKind): number {
    return this.kindRevisions[KIND_CODE.get(kind)!]!
  }

  kindOf(id: number): PartKind {
    return PART_KINDS[this.kinds[id] ?? 0]!
  }

  /** `attributes` is the part's stored JSON text: parts with the same text share a rule class. */
  setPart(id: number, partNumber: string, kind: PartKind, attributes = '{}', yearTo: number | null = null) {
    const previous = this.partNumbers[id]
    const previousKind = previous === undefined ? undefined : this.kinds[id]
    if (previous === undefined) this.partTotal++
    else if (previous !== partNumber && this.byNumber.get(previous) === id) this.byNumber.delete(previous)
    this.partNumbers[id] = partNumber
    if (id >= this.kinds.length) this.kinds = resized(this.kinds, Math.max(id + 1, this.kinds.length * 2))
    const kindCode = KIND_CODE.get(kind) ?? KIND_CODE.get('other')!
    this.kinds[id] = kindCode
    this.kindRevisions[kindCode]!++
    if (previousKind !== undefined && previousKind !== kindCode) this.kindRevisions[previousKind]!++
    this.byNumber.set(partNumber, id)
    this.ruleClasses.set(id, kindCode, previousKind, attributes, yearTo, previous !== partNumber)
  }

  /** The parts of a kind in part-number order, with their rule classes in `ruleClasses`. */
  partsOfKind(kind: PartKind): readonly number[] {
    return this.ruleClasses.partsOfKind(
      KIND_CODE.get(kind)!,
      (id) => (this.partNumbers[id] === undefined ? undefined : this.kinds[id]),
      (id) => this.partNumbers[id] ?? '',
    )
  }

  /** A removed part takes its links and identities with it (the database cascades the same way). */
  removePart(id: number) {
    const partNumber = this.partNumbers[id]
    if (partNumber === undefined) return
    for (const linkId of this.links.idsAt(id)) this.links.remove(linkId)
    const identityIds = this.identities.idsAt(id)
    const ends = identityIds.flatMap((identityId) => {
      const slot = this.identities.slotOf(identityId)
      return [this.identities.a[slot]!, this.identities.b[slot]!]
    })
    for (const identityId of identityIds) this.identities.remove(identityId)
    this.classes.refresh(ends)
    this.ruleClasses.remove(id, this.kinds[id]!)
    this.kindRevisions[this.kinds[id]!]!++
    if (this.byNumber.get(partNumber) === id) this.byNumber.delete(partNumber)
    this.partNumbers[id] = undefined
    this.partTotal--
  }

  setLink(id: number, a: number, b: number, relation: Relation, status: ReviewStatus) {
    let slot = this.links.slotOf(id)
    if (slot >= 0 && (this.links.a[slot] !== a || this.links.b[slot] !== b)) {
      this.links.remove(id)
      slot = -1
    }
    if (slot < 0) slot = this.links.add(id, a, b)
    this.links.review(slot, RELATION_CODE.get(relation)!, STATUS_CODE.get(status)!)
  }

  removeLink(id: number) {
    this.links.remove(id)
  }

  setIdentity(id: number, a: number, b: number) {
    const slot = this.identities.slotOf(id)
    const ends = [a, b]
    if (slot >= 0) {
      if (this.identities.a[slot] === a && this.identities.b[slot] === b) return
      ends.push(this.identities.a[slot]!, this.identities.b[slot]!)
      this.identities.remove(id)
    }
    this.identities.add(id, a, b)
    this.classes.refresh(ends)
  }

  removeIdentity(id: number) {
    const slot = this.identities.slotOf(id)
    if (slot < 0) return
    const ends = [this.identities.a[slot]!, this.identities.b[slot]!]
    this.identities.remove(id)
    this.classes.refresh(ends)
  }

  /**
   * After a bulk load: the classes in one union-find pass instead of one walk
   * per identity, and the path lists packed in part order.
   */
  settle() {
    this.classes.rebuild()
    this.links.paths.pack()
  }

  classOf(id: number): number[] {
    return this.classes.of(id)
  }

  linkAt(slot: number): GraphLink {
    const { links } = this
    return {
      id: links.id[slot]!,
      a: links.a[slot]!,
      b: links.b[slot]!,
      relation: RELATIONS[links.relation[slot]!]!,
      status: REVIEW_STATUSES[links.status[slot]!]!,
    }
  }

  link(id: number): GraphLink | undefined {
    const slot = this.links.slotOf(id)
    return slot < 0 ? undefined : this.linkAt(slot)
  }

  identityAt(slot: number): GraphIdentity {
    return { id: this.identities.id[slot]!, a: this.identities.a[slot]!, b: this.identities.b[slot]! }
  }

  /** The links at a part as objects: for a few parts at a time, not for traversals. */
  linksOf(id: number): GraphLink[] {
    const slots = this.links.slotsAt(id)
    return Array.from({ length: this.links.degreeOf(id) }, (_, i) => this.linkAt(slots[i]!))
  }

  identitiesOf(id: number): GraphIdentity[] {
    const slots = this.identities.slotsAt(id)
    return Array.from({ length: this.identities.degreeOf(id) }, (_, i) => this.identityAt(slots[i]!))
  }

  /** Shortest chain of identity declarations between two identical parts. */
  identityChain(from: number, to: number): GraphIdentity[] {
    if (from === to) return []
    const previous = new Map<number, number>()
    const queue = [from]
    const seen = new Set([from])
    for (let head = 0; head < queue.length; head++) {
      const current = queue[head]!
      const slots = this.identities.slotsAt(current)
      for (let i = 0; i < this.identities.degreeOf(current); i++) {
        const slot = slots[i]!
        const next = this.identities.other(slot, current)
        if (seen.has(next)) continue
        seen.add(next)
        previous.set(next, slot)
        if (next === to) {
          const chain: GraphIdentity[] = []
          for (let node = to; node !== from;) {
            const step = previous.get(node)!
            chain.unshift(this.identityAt(step))
            node = this.identities.other(step, node)
          }
          return chain
        }
        queue.push(next)
      }
    }
    return []
  }

  /**
   * Every part with an approved link to one of `ids`, looking through identical parts on
   * both ends as linkBetween does: one walk of the given parts' links instead of a lookup per candidate.
   */
  linkedWith(ids: readonly number[]): Set<number> {
    const approved = STATUS_CODE.get('approved')!
    const { links } = this
    const found = new Set<number>()
    for (const id of ids) {
      for (const member of this.classOf(id)) {
        const slots = links.slotsAt(member)
        for (let i = 0; i < links.degreeOf(member); i++) {
          const slot = slots[i]!
          if (links.status[slot] !== approved) continue
          const other = links.other(slot, member)
          if (found.has(other)) continue
          for (const identical of this.classOf(other)) found.add(identical)
        }
      }
    }
    return found
  }

  /**
   * The reviewed link that decides a pair, looking through identical parts:
   * a direct link first, then any link between members of the two classes.
   */
  linkBetween(a: number, b: number, statuses: ReviewStatus[] = ['approved']): { link: GraphLink; viaA: number; viaB: number } | null {
    const wanted = statuses.map((status) => STATUS_CODE.get(status)!)
    const classB = this.classOf(b)
    const { links } = this
    let best = -1
    let bestCost = 0
    let bestVia = [0, 0]
    for (const member of this.classOf(a)) {
      const slots = links.slotsAt(member)
      for (let i = 0; i < links.degreeOf(member); i++) {
        const slot = slots[i]!
        if (!wanted.includes(links.status[slot]!)) continue
        const other = links.other(slot, member)
        if (other !== b && (classB.length === 1 || !classB.includes(other))) continue
        const cost = (member === a ? 0 : 1) + (other === b ? 0 : 1)
        if (best < 0 || cost < bestCost || (cost === bestCost && links.id[slot]! < links.id[best]!)) {
          best = slot
          bestCost = cost
          bestVia = [member, other]
        }
      }
    }
    return best < 0 ? null : { link: this.linkAt(best), viaA: bestVia[0]!, viaB: bestVia[1]! }
  }
}
