import { flushPromises, mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import { createMemoryHistory, createRouter, RouterView, type Router } from 'vue-router'
import { useLiveVerdict } from '@/composables/useLiveVerdict'
import { usePlannerBuild } from '@/composables/usePlannerBuild'
import { usePlannerRoute } from '@/composables/usePlannerRoute'
import { usePlannerStore } from '@/stores/planner'
import { makeEvaluation, makePart } from '../../helpers/client-factories'

type Build = ReturnType<typeof usePlannerBuild>

/** The planner's two addresses and a screen to leave to, with one component reading the build. */
async function mountPlanner(start: string, options: { live?: boolean; route?: boolean } = {}) {
  let build: Build | undefined
  const Planner = defineComponent({
    setup() {
      build = usePlannerBuild()
      if (options.live) useLiveVerdict()
      if (options.route) usePlannerRoute()
      return () => h('p', JSON.stringify(build!.query.value))
    },
  })
  const router: Router = createRouter({
    history: createMemoryHistory(),
    routes: [
      { path: '/planner', name: 'planner', component: Planner },
      { path: '/planner/:id(\\d+)', name: 'planner-sheet', component: Planner },
      { path: '/parts', name: 'parts', component: { render: () => h('p', 'parts') } },
    ],
  })
  await router.push(start)
  const pinia = createPinia()
  mount(defineComponent({ render: () => h(RouterView) }), { global: { plugins: [router, pinia] } })
  await router.isReady()
  await flushPromises()
  return { router, build: () => build!, planner: usePlannerStore(pinia) }
}

async function back(router: Router) {
  const arrived = new Promise<void>((resolve) => {
    const stop = router.afterEach(() => {
      stop()
      resolve()
    })
  })
  router.back()
  await arrived
  await flushPromises()
}

/** The network edge: evaluations answer `answer`; the bodies are kept. */
function stubEvaluate(answer = makeEvaluation()) {
  const bodies: unknown[] = []
  vi.stubGlobal('fetch', async (_url: string, init: RequestInit) => {
    bodies.push(JSON.parse(String(init.body)))
    return new Response(JSON.stringify(answer), { status: 200, headers: { 'Content-Type': 'application/json' } })
  })
  return bodies
}

afterEach(() => {
  vi.unstubAllGlobals()
  vi.useRealTimers()
})

describe('the planner build is the address', () => {
  it('reads the slots and context from the route', async () => {
    const { build } = await mountPlanner('/planner?head=ZX-HD-2&block=ZX-BL-1&power=110')
    expect(build().slots.value).toEqual({ block: 'ZX-BL-1', head: 'ZX-HD-2' })
    expect(build().context.value).toEqual({ targetPowerKw: 110 })
    expect(build().filledCount.value).toBe(2)
  })

  it('adds a history entry for each slot change, so Back undoes the last one', async () => {
    const { router, build } = await mountPlanner('/planner?block=ZX-BL-1')
    await build().setSlot('head', 'ZX-HD-2')
    await build().setSlot('head', 'ZX-HD-3')
    expect(router.currentRoute.value.query).toEqual({ block: 'ZX-BL-1', head: 'ZX-HD-3' })

    await back(router)
    expect(build().slots.value).toEqual({ block: 'ZX-BL-1', head: 'ZX-HD-2' })
    await back(router)
    expect(build().slots.value).toEqual({ block: 'ZX-BL-1' })
  })

  it("adds a history entry for a context change and keeps the saved sheet's address", async () => {
    const { router, build } = await mountPlanner('/planner/7?block=ZX-BL-1')
    await build().setContext({ fuelOctane: 95 })
    expect(router.currentRoute.value.fullPath).toBe('/planner/7?block=ZX-BL-1&octane=95')
    await back(router)
    expect(build().context.value).toEqual({})
  })

  it('adds no entry when a change leaves the build as it is', async () => {
    const { router, build } = await mountPlanner('/planner?block=ZX-BL-1')
    const push = vi.spyOn(router, 'push')
    await build().setSlot('block', ' ZX-BL-1 ')
    expect(push).not.toHaveBeenCalled()
  })

  it('tells a build with edits apart from the sheet it came from', async () => {
    const { build, planner } = await mountPlanner('/planner/7?block=ZX-BL-1')
    planner.openSheet({
      id: 7,
      name: 'Bay 3',
      slots: { block: 'ZX-BL-1' },
      targetPowerKw: null,
      fuelOctane: null,
      chassisModelYear: null,
      vin: null,
      vehicleId: null,
      faceFinish: null,
      notes: '',
      checklist: {},
      verdict: null,
      labourMinutes: null,
      owner: { id: 1, name: 'A. Tech' },
      createdAt: '2026-01-01T00:00:00.000Z',
      updatedAt: '2026-01-01T00:00:00.000Z',
    })
    expect(build().isDirty.value).toBe(false)
    await build().setSlot('head', 'ZX-HD-2')
    expect(build().isDirty.value).toBe(true)
  })

  it('counts a ticked checklist step as an unsaved change until it is unticked again', async () => {
    const { build, planner } = await mountPlanner('/planner/7?block=ZX-BL-1')
    planner.openSheet({
      id: 7,
      name: 'Bay 3',
      slots: { block: 'ZX-BL-1' },
      targetPowerKw: null,
      fuelOctane: null,
      chassisModelYear: null,
      vin: null,
      vehicleId: null,
      faceFinish: null,
      notes: '',
      checklist: { 'stud-sleeve': [1] },
      verdict: null,
      labourMinutes: null,
      owner: { id: 1, name: 'A. Tech' },
      createdAt: '2026-01-01T00:00:00.000Z',
      updatedAt: '2026-01-01T00:00:00.000Z',
    })
    expect(planner.isTicked('stud-sleeve', 1)).toBe(true)
    expect(build().isDirty.value).toBe(false)
    planner.setTick('stud-sleeve', 0, true)
    expect(build().isDirty.value).toBe(true)
    planner.setTick('stud-sleeve', 0, false)
    expect(build().isDirty.value).toBe(false)
  })
})

describe('the live verdict', () => {
  it('checks the build once per change, after the edits settle', async () => {
    vi.useFakeTimers()
    const bodies = stubEvaluate()
    const { build } = await mountPlanner('/planner?block=ZX-BL-1', { live: true })
    await vi.runAllTimersAsync()
    await build().setSlot('head', 'ZX-HD-2')
    await build().setSlot('head', 'ZX-HD-3')
    await vi.runAllTimersAsync()
    expect(bodies).toEqual([{ slots: { block: 'ZX-BL-1' } }, { slots: { block: 'ZX-BL-1', head: 'ZX-HD-3' } }])
  })

  it('puts the current number of a typed mark in the address without a new entry or a second check', async () => {
    vi.useFakeTimers()
    const bodies = stubEvaluate(makeEvaluation({ parts: { head: makePart('ZX-HD-2', 'head') } }))
    const { router, build } = await mountPlanner('/planner', { live: true })
    await build().setSlot('head', '2HX')
    await vi.runAllTimersAsync()
    await flushPromises()
    expect(router.currentRoute.value.query).toEqual({ head: 'ZX-HD-2' })
    expect(bodies).toEqual([{ slots: { head: '2HX' } }])
    await back(router)
    expect(build().slots.value).toEqual({})
  })
})

describe('the planner address beyond the build', () => {
  const saved = {
    id: 7,
    name: 'Bay 3',
    slots: { block: 'ZX-BL-1', head: 'ZX-HD-2' },
    targetPowerKw: 110,
    fuelOctane: null,
    chassisModelYear: null,
    vin: null,
    vehicleId: null,
    faceFinish: null,
    notes: '',
    owner: { id: 1, name: 'A. Tech' },
    createdAt: '2026-01-01T00:00:00.000Z',
    updatedAt: '2026-01-01T00:00:00.000Z',
  }
  const stubSheet = () =>
    vi.stubGlobal(
      'fetch',
      async () => new Response(JSON.stringify(saved), { status: 200, headers: { 'Content-Type': 'application/json' } }),
    )

  it('opens a saved sheet by filling its empty address with the sheet, in place of the entry', async () => {
    stubSheet()
    const { router, build, planner } = await mountPlanner('/planner/7', { route: true })
    await flushPromises()
    expect(router.currentRoute.value.fullPath).toBe('/planner/7?block=ZX-BL-1&head=ZX-HD-2&power=110')
    expect(planner.sheet?.name).toBe('Bay 3')
    expect(build().isDirty.value).toBe(false)
  })

  it('keeps the edits of a shared link to a sheet', async () => {
    stubSheet()
    const { router, build } = await mountPlanner('/planner/7?block=ZX-BL-9', { route: true })
    await flushPromises()
    expect(router.currentRoute.value.query).toEqual({ block: 'ZX-BL-9' })
    expect(build().isDirty.value).toBe(true)
  })

  it('goes back to the last build when the planner is opened again from another screen', async () => {
    const { router } = await mountPlanner('/planner?block=ZX-BL-1', { route: true })
    await router.push('/parts')
    await router.push('/planner')
    await flushPromises()
    expect(router.currentRoute.value.fullPath).toBe('/planner?block=ZX-BL-1')
  })
})

describe('opening a sheet that was open before', () => {
  it("shows it as saved when opened again by its plain address (the list's Open)", async () => {
    const saved = {
      id: 7,
      name: 'Bay 3, renamed',
      slots: { block: 'ZX-BL-1' },
      targetPowerKw: null,
      fuelOctane: null,
      chassisModelYear: null,
      vin: null,
      vehicleId: null,
      faceFinish: null,
      notes: '',
      owner: { id: 1, name: 'A. Tech' },
      createdAt: '2026-01-01T00:00:00.000Z',
      updatedAt: '2026-01-02T00:00:00.000Z',
    }
    vi.stubGlobal(
      'fetch',
      async () => new Response(JSON.stringify(saved), { status: 200, headers: { 'Content-Type': 'application/json' } }),
    )
    const { router, planner } = await mountPlanner('/planner/7', { route: true })
    await flushPromises()
    await router.push('/parts')
    await router.push('/planner/7')
    await flushPromises()
    expect(router.currentRoute.value.fullPath).toBe('/planner/7?block=ZX-BL-1')
    expect(planner.sheet?.name).toBe('Bay 3, renamed')
  })
})

describe('emptying the build of an open sheet', () => {
  it('leaves it empty (an edit) instead of filling it from the sheet again', async () => {
    const saved = {
      id: 7,
      name: 'Bay 3',
      slots: { block: 'ZX-BL-1' },
      targetPowerKw: null,
      fuelOctane: null,
      chassisModelYear: null,
      vin: null,
      vehicleId: null,
      faceFinish: null,
      notes: '',
      owner: { id: 1, name: 'A. Tech' },
      createdAt: '2026-01-01T00:00:00.000Z',
      updatedAt: '2026-01-02T00:00:00.000Z',
    }
    vi.stubGlobal(
      'fetch',
      async () => new Response(JSON.stringify(saved), { status: 200, headers: { 'Content-Type': 'application/json' } }),
    )
    const { router, build } = await mountPlanner('/planner/7', { route: true })
    await flushPromises()
    await build().setSlot('block', null)
    await flushPromises()
    expect(router.currentRoute.value.fullPath).toBe('/planner/7')
    expect(build().isDirty.value).toBe(true)
  })
})
