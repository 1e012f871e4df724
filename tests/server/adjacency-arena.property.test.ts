import fc from 'fast-check'
import { describe, it } from 'vitest'
import { AdjacencyArena } from '../../server/fitment/graph/adjacency-arena'

type Operation = { attach: boolean; part: number; neighbour: number; slot: number; pack: boolean }

const operationArb: fc.Arbitrary<Operation> = fc.record({
  attach: fc.boolean(),
  part: fc.integer({ min: 0, max: 40 }),
  neighbour: fc.integer({ min: 0, max: 40 }),
  slot: fc.integer({ min: 0, max: 60 }),
  pack: fc.boolean(),
})

function listOf(arena: AdjacencyArena, part: number): string[] {
  const pairs: string[] = []
  for (let at = arena.runOf(part), i = 0; i < arena.degreeOf(part); i++, at += 2)
    pairs.push(`${arena.entries[at]}:${arena.entries[at + 1]}`)
  return pairs.sort()
}

describe('AdjacencyArena against a plain map of lists', () => {
  it('holds exactly the pairs attached and not detached, at every part, through moves and packs', () => {
    fc.assert(
      fc.property(fc.array(operationArb, { maxLength: 400, size: 'max' }), (operations) => {
        const arena = new AdjacencyArena()
        const model = new Map<number, Map<number, number>>()
        for (const { attach, part, neighbour, slot, pack } of operations) {
          const own = model.get(part) ?? new Map<number, number>()
          model.set(part, own)
          if (attach && !own.has(slot)) {
            arena.attach(part, neighbour, slot)
            own.set(slot, neighbour)
          } else if (!attach && own.has(slot)) {
            arena.detach(part, slot)
            own.delete(slot)
          }
          if (pack && slot % 17 === 0) arena.pack()
        }
        for (let part = 0; part <= 41; part++) {
          const expected = [...(model.get(part) ?? new Map<number, number>())].map(([slot, neighbour]) => `${neighbour}:${slot}`).sort()
          if (listOf(arena, part).join() !== expected.join()) return false
        }
        return true
      }),
      { numRuns: 300 },
    )
  })
})
