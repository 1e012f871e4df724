import { mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { describe, expect, it } from 'vitest'
import ImportsProgress from '@/components/imports/ImportsProgress.vue'
import type { UploadProgress } from '@/api/imports'

function mountProgress(progress: UploadProgress) {
  return mount(ImportsProgress, { props: { progress }, global: { plugins: [PrimeVue] } })
}

const bar = (wrapper: ReturnType<typeof mountProgress>) => wrapper.get('[role="progressbar"]')

describe('ImportsProgress', () => {
  it('shows the write phase as a share of the records written', () => {
    const wrapper = mountProgress({ type: 'progress', phase: 'write', done: 1_250, total: 5_000 })
    expect(wrapper.text()).toContain('Writing in one transaction: 25 %')
    expect(bar(wrapper).attributes('aria-valuenow')).toBe('25')
    expect(bar(wrapper).classes()).toContain('p-progressbar-determinate')
  })

  it('keeps comparing with the catalogue indeterminate, as the server cannot count inside it', () => {
    const wrapper = mountProgress({ type: 'progress', phase: 'check', done: 0, total: 5_000 })
    expect(wrapper.text()).toContain('Comparing with the catalogue')
    expect(wrapper.text()).not.toContain('%')
    expect(bar(wrapper).classes()).toContain('p-progressbar-indeterminate')
  })
})
