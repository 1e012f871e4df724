import { describe, expect, it } from 'vitest'
import { useBusyAction } from '@/composables/useBusyAction'

function deferred() {
  let resolve!: () => void
  let reject!: (error: Error) => void
  const promise = new Promise<void>((res, rej) => {
    resolve = res
    reject = rej
  })
  return { promise, resolve, reject }
}

describe('useBusyAction', () => {
  it('runs an action once when asked twice before it ends (a double click on Fill the gaps)', async () => {
    const pending = deferred()
    let runs = 0
    const action = useBusyAction(() => {
      runs += 1
      return pending.promise
    })
    const first = action.run()
    const second = action.run()
    expect(action.isRunning.value).toBe(true)
    pending.resolve()
    await Promise.all([first, second])
    expect(runs).toBe(1)
    expect(action.isRunning.value).toBe(false)
  })

  it('runs again once the first run has ended, even when it failed', async () => {
    let runs = 0
    const action = useBusyAction(async () => {
      runs += 1
      if (runs === 1) throw new Error('server down')
    })
    await expect(action.run()).rejects.toThrow('server down')
    expect(action.isRunning.value).toBe(false)
    await action.run()
    expect(runs).toBe(2)
  })
})
