import { describe, expect, it } from 'vitest'
import { checkDriveDog, MIN_DOG_ENGAGEMENT_SHARE } from '../../../shared/engineering/drive-dog'

// Engagement left = dog depth − plate thickness: a straight stack-up, hand-worked below.
// The two-thirds minimum is common practice (from memory); the maker's figure governs.
function within(actual: number | undefined, expected: number, tolerance = 1e-9): void {
  expect(actual).toBeDefined()
  expect(Math.abs(actual! - expected)).toBeLessThanOrEqual(tolerance)
}

describe('checkDriveDog (stack-up geometry, hand-worked; minimum common practice)', () => {
  it('keeps two thirds of the dog depth as the minimum (common practice, from memory)', () => {
    within(MIN_DOG_ENGAGEMENT_SHARE, 0.6667, 1e-4)
  })

  it('a 26 mm dog under an 8 mm plate keeps 18 mm against a 17.33 mm minimum: fits', () => {
    // 26 − 8 = 18 mm left; 26 · 2/3 = 17.333 mm minimum
    const check = checkDriveDog({ dogDepthMm: 26, plateThicknessMm: 8 })
    within(check.engagementMm, 18)
    within(check.minEngagementMm, 17.3333, 1e-4)
    expect(check.status).toBe('ok')
  })

  it('a 12 mm dog under an 8 mm plate keeps 4 mm of the 8 mm it needs; the 8 mm longer dog restores 12 mm', () => {
    // 12 − 8 = 4 mm; minimum 12 · 2/3 = 8 mm; with the longer dog 4 + 8 = 12 mm, no deeper than the 12 mm slot
    const check = checkDriveDog({ dogDepthMm: 12, plateThicknessMm: 8, longerDogMm: 8 })
    within(check.engagementMm, 4)
    within(check.minEngagementMm, 8)
    within(check.withLongerDogMm, 12)
    expect(check.status).toBe('longer-dog')
  })

  it('caps the longer dog at the slot depth: 12 mm dog, 8 mm plate, 20 mm longer dog engages 12 mm, not 24', () => {
    within(checkDriveDog({ dogDepthMm: 12, plateThicknessMm: 8, longerDogMm: 20 }).withLongerDogMm, 12)
  })

  it('with no longer dog listed the same 4 mm is too short', () => {
    const check = checkDriveDog({ dogDepthMm: 12, plateThicknessMm: 8 })
    expect(check.status).toBe('too-short')
    expect(check.withLongerDogMm).toBeUndefined()
  })

  it('a longer dog that still leaves too little is too short: 12 mm dog, 8 mm plate, 2 mm longer gives 6 of 8 mm', () => {
    const check = checkDriveDog({ dogDepthMm: 12, plateThicknessMm: 8, longerDogMm: 2 })
    within(check.withLongerDogMm, 6)
    expect(check.status).toBe('too-short')
  })

  it('a plate thicker than the dog leaves no engagement at all (0, never negative)', () => {
    within(checkDriveDog({ dogDepthMm: 6, plateThicknessMm: 10 }).engagementMm, 0)
  })

  it('exactly the minimum is enough: 12 mm dog under a 4 mm plate keeps 8 mm', () => {
    expect(checkDriveDog({ dogDepthMm: 12, plateThicknessMm: 4 }).status).toBe('ok')
  })

  it('rejects a zero dog depth and a negative plate, naming the field', () => {
    expect(() => checkDriveDog({ dogDepthMm: 0, plateThicknessMm: 8 })).toThrow(/dogDepthMm/)
    expect(() => checkDriveDog({ dogDepthMm: 12, plateThicknessMm: -1 })).toThrow(/plateThicknessMm/)
  })
})
