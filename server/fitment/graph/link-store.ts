import { RELATIONS, REVIEW_STATUSES } from '../../../shared/schemas/fitment'
import { AdjacencyArena } from './adjacency-arena'
import { EdgeStore, resized } from './edge-store'

export const RELATION_CODE = new Map<string, number>(RELATIONS.map((relation, index) => [relation, index]))
export const STATUS_CODE = new Map<string, number>(REVIEW_STATUSES.map((status, index) => [status, index]))
export const APPROVED = STATUS_CODE.get('approved')!
export const REJECTED = STATUS_CODE.get('rejected')!
export const DOES_NOT_FIT = RELATION_CODE.get('does-not-fit')!

/**
 * The graph's links: an EdgeStore with each link's relation and review status
 * by slot (as codes), and the approved fit links alone in an AdjacencyArena for
 * path searches, kept in step as a link is reviewed or removed.
 */
export class LinkStore extends EdgeStore {
  relation = new Uint8Array(16)
  status = new Uint8Array(16)
  /** The approved fit links alone, laid out for path searches (1 where a slot is in it). */
  readonly paths = new AdjacencyArena()
  private inPaths = new Uint8Array(16)

  protected override grow(capacity: number) {
    super.grow(capacity)
    this.relation = resized(this.relation, capacity)
    this.status = resized(this.status, capacity)
    this.inPaths = resized(this.inPaths, capacity)
  }

  review(slot: number, relation: number, status: number) {
    this.relation[slot] = relation
    this.status[slot] = status
    const carries = status === APPROVED && relation !== DOES_NOT_FIT
    if (carries === (this.inPaths[slot] === 1)) return
    if (carries) {
      this.paths.attach(this.a[slot]!, this.b[slot]!, slot)
      this.paths.attach(this.b[slot]!, this.a[slot]!, slot)
    } else this.leavePaths(slot)
    this.inPaths[slot] = carries ? 1 : 0
  }

  override remove(id: number): number {
    const slot = this.slotOf(id)
    if (slot >= 0 && this.inPaths[slot] === 1) {
      this.leavePaths(slot)
      this.inPaths[slot] = 0
    }
    return super.remove(id)
  }

  private leavePaths(slot: number) {
    this.paths.detach(this.a[slot]!, slot)
    this.paths.detach(this.b[slot]!, slot)
  }
}
