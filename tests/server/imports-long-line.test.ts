import { afterEach, describe, expect, it } from 'vitest'
import { MAX_HEADER_CHARS } from '../../server/imports/csv/csv-stream'
import { uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
afterEach(() => t.close())

const MB = 1024 * 1024

describe('POST /api/imports, a first line with no line break', () => {
  it('refuses a 20 MB single-line file with a 400 while /api/health keeps answering', async () => {
    t = await createTestApp()
    const editor = await t.signIn('editor')
    const file = Buffer.alloc(20 * MB, 'a')
    file.write('part_number,kind,name,')

    let uploadDone = false
    const upload = uploadCsv(editor, file, { type: 'parts' }).then((response) => {
      uploadDone = true
      return response
    })
    const healthDuringUpload: number[] = []
    while (!uploadDone) {
      const health = await editor.get('/api/health')
      if (!uploadDone) healthDuringUpload.push(health.status)
      await new Promise((resolve) => setTimeout(resolve, 20))
    }
    const response = await upload

    expect(response.status).toBe(400)
    expect(response.body.error.code).toBe('header_too_long')
    expect(response.body.error.message).toMatch(/first line is longer than 64 KB/)
    expect(healthDuringUpload.length).toBeGreaterThan(0)
    expect(healthDuringUpload.every((status) => status === 200)).toBe(true)
  }, 15_000)

  it('still reads a long header line that is under the limit', async () => {
    t = await createTestApp()
    const editor = await t.signIn('editor')
    const padding = ' '.repeat(MAX_HEADER_CHARS - 200)
    const csv = `part_number,kind,name${padding}\nTM-X-1,other,Spacer\n`
    const response = await uploadCsv(editor, csv, { type: 'parts' })
    expect(response.status).toBe(200)
    expect(response.body.counts).toBeDefined()
  })
})
