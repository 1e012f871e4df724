import { flushPromises, mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { afterEach, describe, expect, it, vi } from 'vitest'
import MailView from '@/views/MailView.vue'

const message = (id: number, status: string, lastError = '') => ({
  id,
  kind: 'password-reset',
  recipient: 'tech@fitwright.test',
  subject: `Set a new Fitwright password (${id})`,
  text: 'Hello Dario Lenk,\n\nChoose a new password: http://fitwright.test/set-password#token=(removed)',
  status,
  attempts: lastError ? 2 : 1,
  lastError,
  nextAttemptAt: '2026-03-04T08:20:00.000Z',
  sentAt: status === 'sent' ? '2026-03-04T08:15:05.000Z' : null,
  createdAt: '2026-03-04T08:15:00.000Z',
})

/** The network edge: answers the outbox with two messages, and keeps the queries asked. */
function stubServer() {
  const queries: URLSearchParams[] = []
  vi.stubGlobal('fetch', async (url: string) => {
    queries.push(new URL(url, 'http://fitwright.test').searchParams)
    const items = [message(2, 'failed', 'connect ECONNREFUSED 127.0.0.1:9'), message(1, 'sent')]
    return new Response(JSON.stringify({ items, total: 2 }), { status: 200, headers: { 'Content-Type': 'application/json' } })
  })
  return queries
}

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

describe('MailView', () => {
  it('lists each message with its status in words, tries and last error, and opens one to read its text', async () => {
    const queries = stubServer()
    const wrapper = mount(MailView, { global: { plugins: [PrimeVue] }, attachTo: document.body })
    await flushPromises()
    expect(queries[0]?.get('page')).toBe('1')
    const rows = wrapper.findAll('tbody tr').map((row) => row.text())
    expect(rows[0]).toContain('Gave up')
    expect(rows[0]).toContain('connect ECONNREFUSED 127.0.0.1:9')
    expect(rows[1]).toContain('Sent')

    await wrapper.get('button[aria-label="Read Set a new Fitwright password (1) to tech@fitwright.test"]').trigger('click')
    await flushPromises()
    const text = document.body.querySelector('[aria-label="Message text"]')
    expect(text?.textContent).toContain('Hello Dario Lenk,')
    expect(text?.textContent).toContain('#token=(removed)')
    wrapper.unmount()
  })
})
