import type { EdgeStore } from './edge-store'

/**
 * Identity is transitive: the classes of identical parts. Built by union-find
 * at load; after one identity is added or removed only the classes at its two
 * ends are walked again, so an edit never touches the rest of the catalogue.
 */
export class IdentityClasses {
  private readonly classes = new Map<number, number[]>()

  constructor(private readonly identities: EdgeStore) {}

  /** The part and every part identical to it, lowest id first. */
  of(id: number): number[] {
    return this.classes.get(id) ?? [id]
  }

  rebuild() {
    this.classes.clear()
    const parent = new Map<number, number>()
    const find = (x: number): number => {
      let root = x
      for (let up = parent.get(root); up !== undefined && up !== root; up = parent.get(root)) root = up
      for (let node = x; node !== root;) {
        const next = parent.get(node)!
        parent.set(node, root)
        node = next
      }
      return root
    }
    const { a, b } = this.identities
    for (let slot = 0; slot < this.identities.used; slot++) {
      const x = a[slot]!
      const y = b[slot]!
      if (x < 0) continue
      if (!parent.has(x)) parent.set(x, x)
      if (!parent.has(y)) parent.set(y, y)
      const rx = find(x)
      const ry = find(y)
      if (rx !== ry) parent.set(Math.max(rx, ry), Math.min(rx, ry))
    }
    const members = new Map<number, number[]>()
    for (const id of parent.keys()) {
      const root = find(id)
      const list = members.get(root)
      if (list) list.push(id)
      else members.set(root, [id])
    }
    for (const list of members.values()) this.assign(list)
  }

  /** Walks the class of each given part again (after an identity at them changed). */
  refresh(parts: number[]) {
    const done = new Set<number>()
    for (const start of parts) {
      if (done.has(start)) continue
      const component = this.walk(start)
      for (const id of component) done.add(id)
      if (component.length === 1) this.classes.delete(start)
      else this.assign(component)
    }
  }

  private walk(start: number): number[] {
    const seen = new Set([start])
    const queue = [start]
    for (let head = 0; head < queue.length; head++) {
      const part = queue[head]!
      const slots = this.identities.slotsAt(part)
      for (let i = 0; i < this.identities.degreeOf(part); i++) {
        const next = this.identities.other(slots[i]!, part)
        if (seen.has(next)) continue
        seen.add(next)
        queue.push(next)
      }
    }
    return queue
  }

  private assign(list: number[]) {
    list.sort((x, y) => x - y)
    for (const id of list) this.classes.set(id, list)
  }
}
