import { describe, expect, it } from 'vitest'
import { isCurrentArea, navigationFor, NAVIGATION } from '@/layouts/navigation'

describe('navigationFor', () => {
  it.each([
    ['counter', ['lookup', 'parts', 'graph-home', 'planner', 'quotes'], ['builds', 'users', 'shop-settings']],
    ['tech', ['lookup', 'parts', 'graph-home', 'planner', 'builds', 'quotes'], ['users', 'shop-settings']],
    ['editor', ['lookup', 'parts', 'graph-home', 'planner', 'builds', 'quotes'], ['users', 'shop-settings']],
    ['admin', ['lookup', 'parts', 'graph-home', 'planner', 'builds', 'quotes', 'users', 'shop-settings'], []],
  ] as const)('shows a %s the areas the role may use and none it may not', (role, shown, hidden) => {
    const names = navigationFor(role).map((link) => link.name)
    for (const name of shown) expect(names).toContain(name)
    for (const name of hidden) expect(names).not.toContain(name)
  })

  it('shows nothing without a signed-in user', () => {
    expect(navigationFor(undefined)).toEqual([])
  })

  it("marks the graph link current on a part's graph and on a path, and the planner link on a saved sheet", () => {
    const link = (name: string) => NAVIGATION.find((entry) => entry.name === name)!
    expect(isCurrentArea(link('graph-home'), 'graph')).toBe(true)
    expect(isCurrentArea(link('graph-home'), 'graph-path')).toBe(true)
    expect(isCurrentArea(link('planner'), 'planner-sheet')).toBe(true)
    expect(isCurrentArea(link('planner'), 'builds')).toBe(false)
    expect(isCurrentArea(link('quotes'), 'quote')).toBe(true)
  })
})
