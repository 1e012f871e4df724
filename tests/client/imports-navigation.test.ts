import { describe, expect, it } from 'vitest'
import { navigationFor } from '@/layouts/navigation'

describe('navigationFor, imports', () => {
  it.each([
    ['editor', true],
    ['admin', true],
    // The counter imports its stock book there.
    ['counter', true],
    ['tech', false],
  ] as const)('shows the imports area to a %s: %s', (role, shown) => {
    expect(navigationFor(role).some((link) => link.name === 'imports')).toBe(shown)
  })
})
