import { afterEach, describe, expect, it, vi } from 'vitest'
import { ApiError, setUnauthorizedHandler } from '@/api/http'
import { importsApi, type UploadProgress } from '@/api/imports'

/** Stands in for the browser's XMLHttpRequest, the network edge, and plays back an answer in pieces. */
class FakeXhr {
  static last: FakeXhr | null = null
  status = 0
  responseText = ''
  sent: FormData | null = null
  headers: Record<string, string> = {}
  upload: { onprogress: ((event: { loaded: number; total: number }) => void) | null } = { onprogress: null }
  onprogress: (() => void) | null = null
  onload: (() => void) | null = null
  onerror: (() => void) | null = null
  constructor() {
    FakeXhr.last = this
  }
  open() {}
  setRequestHeader(name: string, value: string) {
    this.headers[name] = value
  }
  send(form: FormData) {
    this.sent = form
  }
  /** The server's answer arriving in the given pieces, then the end. */
  answer(status: number, pieces: string[]) {
    this.status = status
    for (const piece of pieces) {
      this.responseText += piece
      this.onprogress?.()
    }
    this.onload?.()
  }
}

afterEach(() => vi.unstubAllGlobals())

function startUpload(progress: UploadProgress[]) {
  vi.stubGlobal('XMLHttpRequest', FakeXhr)
  const file = new File(['part_number,kind,name\n'], 'parts.csv', { type: 'text/csv' })
  const promise = importsApi.upload({ file, type: 'parts', mode: 'commit', validRowsOnly: true, onProgress: (p) => progress.push(p) })
  return { promise, xhr: FakeXhr.last! }
}

const result = {
  batchId: 7,
  counts: { created: 1, updated: 0, unchanged: 0, rejected: 0 },
  errors: [],
  changes: [],
  omitted: { errors: 0, changes: 0 },
}

describe('importsApi.upload', () => {
  it('sends the form fields and file, reports upload and server progress, and resolves with the result line', async () => {
    const progress: UploadProgress[] = []
    const { promise, xhr } = startUpload(progress)
    expect(xhr.headers.Accept).toBe('application/x-ndjson')
    expect(xhr.sent?.get('type')).toBe('parts')
    expect(xhr.sent?.get('mode')).toBe('commit')
    expect(xhr.sent?.get('validRowsOnly')).toBe('true')
    expect((xhr.sent?.get('file') as File).name).toBe('parts.csv')
    xhr.upload.onprogress?.({ loaded: 5, total: 10 })
    const read = JSON.stringify({ type: 'progress', phase: 'read', done: 10, total: 10 })
    const last = JSON.stringify({ type: 'result', status: 201, body: result })
    // A line split across two pieces must still be read whole.
    xhr.answer(200, [`${read.slice(0, 12)}`, `${read.slice(12)}\n${last.slice(0, 30)}`, `${last.slice(30)}\n`])
    await expect(promise).resolves.toEqual(result)
    expect(progress).toEqual([
      { type: 'progress', phase: 'upload', done: 5, total: 10 },
      { type: 'progress', phase: 'read', done: 10, total: 10 },
    ])
  })

  it('rejects with the status and code of an error line', async () => {
    const { promise, xhr } = startUpload([])
    const error = { type: 'error', status: 422, body: { error: { code: 'rows_rejected', message: '1 of 2 rows have errors.' } } }
    xhr.answer(200, [`${JSON.stringify(error)}\n`])
    const rejection = await promise.catch((cause: unknown) => cause)
    expect(rejection).toBeInstanceOf(ApiError)
    expect(rejection).toMatchObject({ status: 422, code: 'rows_rejected', message: '1 of 2 rows have errors.' })
  })

  it('rejects with the plain error answer the server sends before streaming', async () => {
    const { promise, xhr } = startUpload([])
    xhr.answer(413, [JSON.stringify({ error: { code: 'file_too_large', message: 'The file is larger than 50 MB.' } })])
    await expect(promise).rejects.toMatchObject({ status: 413, code: 'file_too_large' })
  })

  it('tells the one 401 handler once and sends no other request when the session ended before the upload', async () => {
    const onUnauthorized = vi.fn()
    setUnauthorizedHandler(onUnauthorized)
    const fetchSpy = vi.fn()
    vi.stubGlobal('fetch', fetchSpy)
    const { promise, xhr } = startUpload([])
    xhr.answer(401, [JSON.stringify({ error: { code: 'unauthorized', message: 'Sign in first.' } })])
    await expect(promise).rejects.toMatchObject({ status: 401, code: 'unauthorized', message: 'Sign in first.' })
    expect(onUnauthorized).toHaveBeenCalledTimes(1)
    expect(fetchSpy).not.toHaveBeenCalled()
  })

  it('rejects when the answer ends without a result line', async () => {
    const { promise, xhr } = startUpload([])
    xhr.answer(200, [`${JSON.stringify({ type: 'progress', phase: 'read', done: 1, total: 9 })}\n`])
    await expect(promise).rejects.toMatchObject({ code: 'incomplete' })
  })
})
