import { resized } from './edge-store'

/**
 * Per-part lists of (neighbour, slot) pairs in one shared Int32Array, each
 * part's list in one run. A breadth-first search then reads its neighbours in
 * order, instead of chasing one small array per part and then both ends of
 * every pair by slot: at a million links that is the difference between a
 * search in tens of milliseconds and one in hundreds.
 *
 * A list that outgrows its run moves to the free end. When the array is full
 * the live runs are packed again in part order, into an array with room to
 * spare: the cost of the resize it replaces, so it stays rare and amortised.
 */
export class AdjacencyArena {
  /** Pairs: entries[run + 2i] is the neighbour, entries[run + 2i + 1] the pair's slot. */
  entries = new Int32Array(64)
  private start = new Int32Array(16)
  private room = new Int32Array(16)
  private degree = new Int32Array(16)
  private end = 0

  degreeOf(part: number): number {
    return part < this.degree.length ? this.degree[part]! : 0
  }

  /** Where the part's pairs begin in `entries` (read `degreeOf(part)` pairs from there). */
  runOf(part: number): number {
    return part < this.start.length ? this.start[part]! : 0
  }

  attach(part: number, neighbour: number, slot: number) {
    if (part >= this.degree.length) this.growParts(part + 1)
    const length = this.degree[part]!
    if (length === this.room[part]) this.move(part, Math.max(4, length * 2))
    const at = this.start[part]! + 2 * length
    this.entries[at] = neighbour
    this.entries[at + 1] = slot
    this.degree[part] = length + 1
  }

  detach(part: number, slot: number) {
    const length = this.degreeOf(part)
    const first = this.start[part] ?? 0
    const last = first + 2 * (length - 1)
    for (let at = first; at <= last; at += 2) {
      if (this.entries[at + 1] !== slot) continue
      this.entries[at] = this.entries[last]!
      this.entries[at + 1] = this.entries[last + 1]!
      this.degree[part] = length - 1
      return
    }
  }

  /** Lays every run out again in part order with a little slack (after a bulk load). */
  pack(sparePairs = 0) {
    let needed = sparePairs
    for (let part = 0; part < this.degree.length; part++) needed += roomFor(this.degree[part]!)
    const next = new Int32Array(Math.max(64, 2 * needed * 2))
    let at = 0
    for (let part = 0; part < this.degree.length; part++) {
      const length = this.degree[part]!
      if (length === 0) {
        this.room[part] = 0
        this.start[part] = 0
        continue
      }
      const first = this.start[part]!
      next.set(this.entries.subarray(first, first + 2 * length), at)
      this.start[part] = at
      this.room[part] = roomFor(length)
      at += 2 * this.room[part]!
    }
    this.entries = next
    this.end = at
  }

  private move(part: number, room: number) {
    if (this.end + 2 * room > this.entries.length) {
      this.pack(room)
      if (this.degree[part]! < this.room[part]!) return
    }
    const first = this.start[part]!
    this.entries.copyWithin(this.end, first, first + 2 * this.degree[part]!)
    this.start[part] = this.end
    this.room[part] = room
    this.end += 2 * room
  }

  private growParts(size: number) {
    const capacity = Math.max(size, this.degree.length * 2)
    this.start = resized(this.start, capacity)
    this.room = resized(this.room, capacity)
    this.degree = resized(this.degree, capacity)
  }
}

function roomFor(length: number): number {
  return length === 0 ? 0 : length + (length >> 2) + 2
}
