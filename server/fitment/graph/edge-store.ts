/**
 * Pairs of parts (links or identities) in parallel typed arrays: a slot per
 * pair, an id → slot table and per-part adjacency lists of slots. No object
 * per pair, so a million links cost tens of megabytes, not a gigabyte.
 */
export class EdgeStore {
  a = new Int32Array(16)
  b = new Int32Array(16)
  id = new Int32Array(16)
  /** Slots handed out so far (free ones included); the traversals stop here. */
  used = 0
  size = 0
  private readonly free: number[] = []
  private slotById = new Int32Array(16).fill(-1)
  private adjacency: (Int32Array | undefined)[] = []
  private degree = new Int32Array(16)

  protected grow(capacity: number) {
    this.a = resized(this.a, capacity)
    this.b = resized(this.b, capacity)
    this.id = resized(this.id, capacity)
  }

  slotOf(id: number): number {
    return id < this.slotById.length ? this.slotById[id]! : -1
  }

  /** Adds a pair that is not stored yet; answers its slot. */
  add(id: number, a: number, b: number): number {
    let slot = this.free.pop()
    if (slot === undefined) {
      if (this.used === this.a.length) this.grow(this.a.length * 2)
      slot = this.used++
    }
    this.a[slot] = a
    this.b[slot] = b
    this.id[slot] = id
    if (id >= this.slotById.length) this.slotById = resized(this.slotById, Math.max(id + 1, this.slotById.length * 2), -1)
    this.slotById[id] = slot
    this.attach(a, slot)
    this.attach(b, slot)
    this.size++
    return slot
  }

  /** Removes a pair by id; answers the slot it had, or -1. */
  remove(id: number): number {
    const slot = this.slotOf(id)
    if (slot < 0) return -1
    this.detach(this.a[slot]!, slot)
    this.detach(this.b[slot]!, slot)
    this.a[slot] = -1
    this.b[slot] = -1
    this.id[slot] = 0
    this.slotById[id] = -1
    this.free.push(slot)
    this.size--
    return slot
  }

  /** The slots at a part; read the first `degreeOf(part)` entries only. */
  slotsAt(part: number): Int32Array {
    return this.adjacency[part] ?? EMPTY
  }

  degreeOf(part: number): number {
    return part < this.degree.length ? this.degree[part]! : 0
  }

  /** Ids of every pair at a part (for removing a part with what hangs on it). */
  idsAt(part: number): number[] {
    const slots = this.slotsAt(part)
    const ids: number[] = []
    for (let i = 0; i < this.degreeOf(part); i++) ids.push(this.id[slots[i]!]!)
    return ids
  }

  other(slot: number, end: number): number {
    const a = this.a[slot]!
    return a === end ? this.b[slot]! : a
  }

  private attach(part: number, slot: number) {
    if (part >= this.degree.length) this.degree = resized(this.degree, Math.max(part + 1, this.degree.length * 2))
    let list = this.adjacency[part]
    const length = this.degree[part]!
    if (!list || length === list.length) {
      list = resized(list ?? EMPTY, Math.max(4, length * 2))
      this.adjacency[part] = list
    }
    list[length] = slot
    this.degree[part] = length + 1
  }

  private detach(part: number, slot: number) {
    const list = this.adjacency[part]
    if (!list) return
    const last = this.degree[part]! - 1
    for (let i = 0; i <= last; i++) {
      if (list[i] !== slot) continue
      list[i] = list[last]!
      this.degree[part] = last
      if (last === 0) this.adjacency[part] = undefined
      return
    }
  }
}

const EMPTY = new Int32Array(0)

export function resized<T extends Int32Array | Uint8Array>(array: T, capacity: number, fill = 0): T {
  const next = new (array.constructor as new (length: number) => T)(capacity)
  next.set(array.subarray(0, Math.min(array.length, capacity)))
  if (fill !== 0 && capacity > array.length) next.fill(fill, array.length)
  return next
}
