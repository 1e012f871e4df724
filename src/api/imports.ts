import {
  importBatchListSchema,
  importBatchSchema,
  importResultSchema,
  importStreamLineSchema,
  type ExportFile,
  type ImportMode,
  type ImportProgress,
  type ImportResult,
  type ImportStreamLine,
  type ImportType,
} from '@shared/schemas/imports'
import { ApiError, apiErrorFrom, apiUrl, csrfHeader, networkError, notifyUnauthorized, request } from './http'

/** Sending the file (measured by the browser), then the server's own phases. */
export type UploadProgress = { type: 'progress'; phase: 'upload'; done: number; total: number } | ImportProgress

export type UploadRequest = {
  file: File
  type: ImportType
  mode: ImportMode
  validRowsOnly: boolean
  onProgress: (progress: UploadProgress) => void
}

function parseJson(text: string): unknown {
  try {
    return JSON.parse(text)
  } catch {
    return null
  }
}

/**
 * POST /api/imports with progress. XMLHttpRequest rather than fetch, because
 * only it reports how much of the upload has been sent; the answer is
 * newline-delimited JSON (progress lines, then the result) read as it arrives.
 */
function upload({ file, type, mode, validRowsOnly, onProgress }: UploadRequest): Promise<ImportResult> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest()
    let read = 0
    let last: ImportStreamLine | null = null
    const readLines = () => {
      const text = xhr.responseText
      for (let end = text.indexOf('\n', read); end !== -1; end = text.indexOf('\n', read)) {
        const line = importStreamLineSchema.safeParse(parseJson(text.slice(read, end)))
        read = end + 1
        if (!line.success) continue
        if (line.data.type === 'progress') onProgress(line.data)
        else last = line.data
      }
    }
    xhr.upload.onprogress = (event) => onProgress({ type: 'progress', phase: 'upload', done: event.loaded, total: event.total })
    xhr.onprogress = () => {
      if (xhr.status === 200) readLines()
    }
    xhr.onerror = () => reject(networkError())
    xhr.onload = () => {
      if (xhr.status !== 200) {
        if (xhr.status === 401) notifyUnauthorized()
        return reject(apiErrorFrom(xhr.status, parseJson(xhr.responseText)))
      }
      readLines()
      const answer = last as ImportStreamLine | null
      if (answer?.type === 'result') {
        const result = importResultSchema.safeParse(answer.body)
        return result.success
          ? resolve(result.data)
          : reject(new ApiError(0, 'bad_answer', 'The server sent an answer this page does not understand.'))
      }
      if (answer?.type === 'error') return reject(apiErrorFrom(answer.status, answer.body))
      reject(
        new ApiError(0, 'incomplete', 'The server stopped answering before the import finished. Check the batch list before trying again.'),
      )
    }
    const form = new FormData()
    form.append('type', type)
    form.append('mode', mode)
    form.append('validRowsOnly', String(validRowsOnly))
    form.append('file', file)
    xhr.open('POST', apiUrl('/imports'))
    xhr.setRequestHeader('Accept', 'application/x-ndjson')
    for (const [name, value] of Object.entries(csrfHeader())) xhr.setRequestHeader(name, value)
    xhr.send(form)
  })
}

export const importsApi = {
  upload,
  list: (signal?: AbortSignal) => request('GET', '/imports', importBatchListSchema, { signal }),
  revert: (id: number) => request('POST', `/imports/${id}/revert`, importBatchSchema),
  /** A plain link: the browser downloads the attachment with the session cookie. */
  exportUrl: (file: ExportFile) => apiUrl(`/export/${file}`),
}
