import type { PartAttributes } from '../../../shared/schemas/part-attributes'
import { resized } from './edge-store'

/** What the pair rules read of a part besides its kind: its attributes and its last model year. */
export type RuleInput = { attributes: PartAttributes; yearTo: number | null }

const NONE = -1

/**
 * Parts grouped by what the rules read of them, kept beside the fit graph so
 * inferring fits never reads the part table: parts with the same attributes
 * and last year share one class (an id that is never reused), and each kind
 * keeps its parts in part-number order for paging. The order is restored
 * lazily, on the first read after a write, for the one kind that changed.
 */
export class AttributeClasses {
  private readonly classByKey = new Map<string, number>()
  private readonly keys: string[] = []
  private readonly inputs: (RuleInput | undefined)[] = []
  private classOfPart = new Int32Array(16).fill(NONE)
  private readonly byKind = new Map<number, { ids: number[]; sorted: boolean }>()

  /**
   * Records a part's kind (as the graph's code) and rule input; `attributes` is the stored JSON text.
   * `renumbered` says the part number changed, which is all that can unsettle the kind's order.
   */
  set(id: number, kindCode: number, previousKind: number | undefined, attributes: string, yearTo: number | null, renumbered = true) {
    const key = `${yearTo ?? ''}|${attributes}`
    let classId = this.classByKey.get(key)
    if (classId === undefined) {
      classId = this.keys.length
      this.keys.push(key)
      this.classByKey.set(key, classId)
    }
    if (id >= this.classOfPart.length) this.classOfPart = resized(this.classOfPart, Math.max(id + 1, this.classOfPart.length * 2), NONE)
    const known = this.classOfPart[id] !== NONE
    this.classOfPart[id] = classId
    if (known && previousKind === kindCode) {
      if (renumbered) this.listOf(kindCode).sorted = false
      return
    }
    if (known && previousKind !== undefined) this.listOf(previousKind).sorted = false
    const list = this.listOf(kindCode)
    list.ids.push(id)
    list.sorted = false
  }

  remove(id: number, kindCode: number) {
    if (id >= this.classOfPart.length || this.classOfPart[id] === NONE) return
    this.classOfPart[id] = NONE
    this.listOf(kindCode).sorted = false
  }

  /** The class of a part, or -1 for a part not held. */
  classOf(id: number): number {
    return id < this.classOfPart.length ? this.classOfPart[id]! : NONE
  }

  /** A class's attributes and last year, parsed once. */
  input(classId: number): RuleInput {
    let input = this.inputs[classId]
    if (!input) {
      const key = this.keys[classId]!
      const bar = key.indexOf('|')
      const year = key.slice(0, bar)
      input = { attributes: JSON.parse(key.slice(bar + 1)) as PartAttributes, yearTo: year === '' ? null : Number(year) }
      this.inputs[classId] = input
    }
    return input
  }

  /**
   * The parts of a kind in part-number order (byte order, as the database sorts
   * them). `kindOf` and `numberOf` come from the graph: a part that left the
   * kind or the catalogue is dropped when the list is put back in order.
   */
  partsOfKind(kindCode: number, kindOf: (id: number) => number | undefined, numberOf: (id: number) => string): readonly number[] {
    const list = this.byKind.get(kindCode)
    if (!list) return []
    if (!list.sorted) {
      const seen = new Set<number>()
      const ids = list.ids.filter((id) => {
        if (seen.has(id) || this.classOf(id) === NONE || kindOf(id) !== kindCode) return false
        seen.add(id)
        return true
      })
      const numbers = new Map(ids.map((id) => [id, numberOf(id)]))
      ids.sort((x, y) => {
        const a = numbers.get(x)!
        const b = numbers.get(y)!
        return a < b ? -1 : a > b ? 1 : 0
      })
      list.ids = ids
      list.sorted = true
    }
    return list.ids
  }

  private listOf(kindCode: number) {
    let list = this.byKind.get(kindCode)
    if (!list) {
      list = { ids: [], sorted: true }
      this.byKind.set(kindCode, list)
    }
    return list
  }
}
