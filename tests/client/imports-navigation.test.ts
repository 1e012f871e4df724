import { describe, expect, it } from 'vitest'
import { navigationFor } from '@/layouts/navigation'

describe('navigationFor, imports', () => {
  it.each([
    ['editor', true],
    ['admin', true],
    ['counter', false],
    ['tech', false],
  ] as const)('shows the imports area to a %s: %s', (role, shown) => {
    expect(navigationFor(role).some((link) => link.name === 'imports')).toBe(shown)
  })
})
