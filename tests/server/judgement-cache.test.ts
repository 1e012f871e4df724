import { describe, expect, it } from 'vitest'
import { JudgementCache, type CandidateInput, type CandidateReads } from '../../server/builds/judgement-cache'

const candidate = (partNumber: string, attributes: Record<string, string | number>, yearTo: number | null = 2001): CandidateInput => ({
  partNumber,
  attributes,
  yearTo,
})

/** A judgement that reads the bore, and the seal only where the bore is small: its verdict names both. */
function judgeByBore(runs: string[]) {
  return async (part: CandidateReads['part']) => {
    runs.push(part.partNumber)
    const bore = Number(part.attributes.boreMm)
    return bore < 80 ? `small, seal ${String(part.attributes.sealMm)}` : 'large'
  }
}

describe('JudgementCache', () => {
  it('answers a candidate that agrees on every value read without judging it again', async () => {
    const cache = new JudgementCache<string>()
    const runs: string[] = []
    const first = await cache.judge(candidate('A-1', { boreMm: 86, sealMm: 14, flow: 190 }), judgeByBore(runs))
    const second = await cache.judge(candidate('A-2', { boreMm: 86, sealMm: 11, flow: 250 }, 1995), judgeByBore(runs))
    expect([first, second]).toEqual(['large', 'large'])
    expect(runs).toEqual(['A-1'])
  })

  it('judges again when a value that was read differs, including a read that found nothing', async () => {
    const cache = new JudgementCache<string>()
    const runs: string[] = []
    await cache.judge(candidate('B-1', { boreMm: 76, sealMm: 14 }), judgeByBore(runs))
    const otherSeal = await cache.judge(candidate('B-2', { boreMm: 76, sealMm: 11 }), judgeByBore(runs))
    const noSeal = await cache.judge(candidate('B-3', { boreMm: 76 }), judgeByBore(runs))
    const sameAsFirst = await cache.judge(candidate('B-4', { boreMm: 76, sealMm: 14, flow: 300 }), judgeByBore(runs))
    expect([otherSeal, noSeal, sameAsFirst]).toEqual(['small, seal 11', 'small, seal undefined', 'small, seal 14'])
    expect(runs).toEqual(['B-1', 'B-2', 'B-3'])
  })

  it('tells candidates apart by last year and by number once the judgement reads them', async () => {
    const cache = new JudgementCache<string>()
    const runs: string[] = []
    const byYear = async (part: CandidateReads['part']) => {
      runs.push(part.partNumber)
      return `until ${part.yearTo}`
    }
    await cache.judge(candidate('C-1', { boreMm: 86 }, 1999), byYear)
    expect(await cache.judge(candidate('C-2', { boreMm: 80 }, 1999), byYear)).toBe('until 1999')
    expect(await cache.judge(candidate('C-3', { boreMm: 86 }, 2004), byYear)).toBe('until 2004')

    const byNumber = new JudgementCache<string>()
    const named = async (part: CandidateReads['part'], reads?: CandidateReads) => {
      runs.push(part.partNumber)
      return String(reads!.trackNumber<Record<string, string>>({ injector: part.partNumber }, 'injector').injector)
    }
    await byNumber.judge(candidate('D-1', {}), named)
    expect(await byNumber.judge(candidate('D-2', {}), named)).toBe('D-2')
    expect(runs).toEqual(['C-1', 'C-3', 'D-1', 'D-2'])
  })

  it('compares the whole attribute set when a judgement lists or copies the attributes', async () => {
    const cache = new JudgementCache<string>()
    const runs: string[] = []
    const copies = async (part: CandidateReads['part']) => {
      runs.push(part.partNumber)
      return Object.keys({ ...part.attributes }).join()
    }
    await cache.judge(candidate('E-1', { boreMm: 86 }), copies)
    expect(await cache.judge(candidate('E-2', { boreMm: 86, sealMm: 14 }), copies)).toBe('boreMm,sealMm')
    expect(await cache.judge(candidate('E-3', { boreMm: 86 }), copies)).toBe('boreMm')
    expect(runs).toEqual(['E-1', 'E-2'])
  })

  it('stops comparing once almost every candidate differs in what is read, and still judges each one', async () => {
    const cache = new JudgementCache<string>()
    const runs: string[] = []
    const tracked: boolean[] = []
    const judge = async (part: CandidateReads['part'], reads?: CandidateReads) => {
      runs.push(part.partNumber)
      tracked.push(reads !== undefined)
      return `bore ${String(part.attributes.boreMm)}`
    }
    for (let bore = 0; bore < 250; bore++) await cache.judge(candidate(`F-${bore}`, { boreMm: bore }), judge)
    const again = await cache.judge(candidate('F-again', { boreMm: 3 }), judge)
    expect(again).toBe('bore 3')
    expect(runs).toHaveLength(251)
    expect(tracked.slice(0, 200).every(Boolean)).toBe(true)
    expect(tracked.slice(200).some(Boolean)).toBe(false)
  })
})
