import { mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { describe, expect, it } from 'vitest'
import ImportsCommitBar from '@/components/imports/ImportsCommitBar.vue'

function mountBar(rejectedRows: number) {
  return mount(ImportsCommitBar, { props: { rejectedRows, busy: false }, global: { plugins: [PrimeVue] }, attachTo: document.body })
}

const commitButton = (wrapper: ReturnType<typeof mountBar>) => wrapper.findAll('button').find((button) => button.text().includes('Commit'))!

describe('ImportsCommitBar', () => {
  it('commits a clean preview straight away, whole', async () => {
    const wrapper = mountBar(0)
    await commitButton(wrapper).trigger('click')
    expect(wrapper.emitted('commit')).toEqual([[false]])
    wrapper.unmount()
  })

  it('holds back a file with rejected rows until the editor explicitly chooses to commit only the valid rows', async () => {
    const wrapper = mountBar(2)
    expect(wrapper.text()).toContain('2 rows have errors')
    expect(commitButton(wrapper).attributes('disabled')).toBeDefined()
    await wrapper.get('input#import-valid-rows-only').setValue(true)
    expect(commitButton(wrapper).attributes('disabled')).toBeUndefined()
    await commitButton(wrapper).trigger('click')
    expect(wrapper.emitted('commit')).toEqual([[true]])
    wrapper.unmount()
  })
})
