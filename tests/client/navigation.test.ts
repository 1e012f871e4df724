import { describe, expect, it } from 'vitest'
import { navigationFor } from '@/layouts/navigation'

describe('navigationFor', () => {
  it.each([
    ['counter', ['parts']],
    ['tech', ['parts']],
    ['editor', ['parts']],
    ['admin', ['parts', 'users']],
  ] as const)('shows a %s only the areas the role may use', (role, expected) => {
    const names = navigationFor(role).map((link) => link.name)
    for (const name of expected) expect(names).toContain(name)
    if (role !== 'admin') expect(names).not.toContain('users')
  })

  it('shows nothing without a signed-in user', () => {
    expect(navigationFor(undefined)).toEqual([])
  })
})
