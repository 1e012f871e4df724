import { createHash } from 'node:crypto'
import { Readable } from 'node:stream'
import Papa from 'papaparse'

export type CsvFileProblem = 'empty' | 'binary' | 'too_many_rows' | 'malformed' | 'header_too_long'

/** Longest header line accepted: hundreds of columns fit; a file with no line break does not. */
export const MAX_HEADER_CHARS = 64 * 1024

/** A problem with the file as a whole: no row of it can be judged. */
export class CsvFileError extends Error {
  constructor(
    readonly problem: CsvFileProblem,
    message: string,
  ) {
    super(message)
    this.name = 'CsvFileError'
  }
}

export type CsvReadOptions = {
  /** Most data rows accepted; one more stops the read. */
  maxRows: number
  /** The first non-blank row; may throw to stop the read. */
  onHeader: (cells: string[], row: number) => void
  /** Every later non-blank row. `row` counts records from 1, as a spreadsheet numbers its rows. */
  onRow: (cells: string[], row: number) => void
  /** Bytes read so far, after each chunk of the file. */
  onProgress?: (bytesRead: number) => void
}

export type CsvReadSummary = { sha256: string; bytes: number; rows: number; delimiter: string }

export const DELIMITERS = [',', ';', '\t'] as const

/**
 * The delimiter is the candidate that splits the header line into the most
 * fields (quoted parts ignored); comma when none does. Papaparse's own guess
 * trips over a trailing newline in narrow files, and the header is the one
 * line whose shape we know.
 */
export function detectDelimiter(text: string): string {
  const firstLine = text.split(/\r\n|\r|\n/).find((line) => line.trim() !== '') ?? ''
  const line = firstLine.replace(/"[^"]*"/g, '')
  let best: string = ','
  let bestCount = 0
  for (const delimiter of DELIMITERS) {
    const count = line.split(delimiter).length - 1
    if (count > bestCount) {
      best = delimiter
      bestCount = count
    }
  }
  return best
}

/**
 * The file's bytes as UTF-8 text (a byte-order mark dropped), refusing binary
 * data and bytes that are not UTF-8, hashing as it goes.
 */
async function* utf8Text(input: Readable, hash: ReturnType<typeof createHash>, onBytes: (total: number) => void) {
  const decoder = new TextDecoder('utf-8', { fatal: true })
  let total = 0
  const notText = () =>
    new CsvFileError(
      'binary',
      'This is not a CSV text file: it holds binary data or text that is not UTF-8. Save the sheet as "CSV UTF-8" and upload that.',
    )
  for await (const chunk of input) {
    const bytes: Buffer = typeof chunk === 'string' ? Buffer.from(chunk) : (chunk as Buffer)
    if (bytes.includes(0)) throw notText()
    hash.update(bytes)
    total += bytes.length
    let text: string
    try {
      text = decoder.decode(bytes, { stream: true })
    } catch {
      throw notText()
    }
    onBytes(total)
    if (text) yield text
  }
  try {
    const rest = decoder.decode()
    if (rest) yield rest
  } catch {
    throw notText()
  }
}

/**
 * Enough text to hold the first non-blank line whole. One pass over each new
 * chunk (a pattern re-run over the growing text took seconds on a long line),
 * and a header line past MAX_HEADER_CHARS stops the read.
 */
async function readHead(text: AsyncGenerator<string>): Promise<string> {
  let head = ''
  let lineStart = -1
  for (;;) {
    const next = await text.next()
    if (next.done) return head
    const from = head.length
    head += next.value
    for (let i = from; i < head.length; i += 1) {
      const char = head.charCodeAt(i)
      const isBreak = char === 10 || char === 13
      if (lineStart < 0) {
        if (!isBreak && char !== 32 && char !== 9 && char !== 0xfeff) lineStart = i
      } else if (isBreak) {
        return head
      }
    }
    if (lineStart >= 0 && head.length - lineStart > MAX_HEADER_CHARS) {
      throw new CsvFileError(
        'header_too_long',
        `The first line is longer than ${MAX_HEADER_CHARS / 1024} KB with no line break; the first line must be the header row of column names.`,
      )
    }
  }
}

const isBlank = (cells: string[]) => cells.every((cell) => cell.trim() === '')

/**
 * Streams a CSV file through papaparse (RFC 4180 quoting, comma, semicolon or
 * tab) and hands over its rows one by one, so a large file is never held as
 * one string.
 */
export async function readCsvStream(input: Readable, options: CsvReadOptions): Promise<CsvReadSummary> {
  const hash = createHash('sha256')
  let bytes = 0
  const text = utf8Text(input, hash, (total) => {
    bytes = total
    options.onProgress?.(total)
  })
  let head = ''
  try {
    head = await readHead(text)
  } catch (error) {
    input.destroy()
    throw error
  }
  if (head.trim() === '') throw new CsvFileError('empty', 'The file is empty.')
  const delimiter = detectDelimiter(head)
  const source = Readable.from(
    (async function* () {
      yield head
      yield* text
    })(),
  )

  let records = 0
  let dataRows = 0
  let headerSeen = false
  await new Promise<void>((resolve, reject) => {
    // Reject before aborting: papaparse calls complete() from abort(), which would resolve first.
    const fail = (error: unknown, parser?: Papa.Parser) => {
      reject(error)
      parser?.abort()
      source.destroy()
      input.destroy()
    }
    Papa.parse<string[], Readable>(source, {
      delimiter,
      skipEmptyLines: false,
      chunk(results, parser) {
        const quoteError = results.errors.find((error) => error.type === 'Quotes')
        if (quoteError) {
          const near = records + (quoteError.row ?? 0) + 1
          return fail(
            new CsvFileError(
              'malformed',
              `Near row ${near}: ${quoteError.message.toLowerCase()}. A quote inside a quoted cell is written as two quotes ("").`,
            ),
            parser,
          )
        }
        try {
          for (const cells of results.data) {
            records += 1
            if (isBlank(cells)) continue
            if (!headerSeen) {
              headerSeen = true
              options.onHeader(cells, records)
              continue
            }
            dataRows += 1
            if (dataRows > options.maxRows) {
              throw new CsvFileError('too_many_rows', `The file has more than ${options.maxRows} rows, the most one import takes.`)
            }
            options.onRow(cells, records)
          }
        } catch (error) {
          fail(error, parser)
        }
      },
      complete: () => resolve(),
      error: (error) => fail(error),
    })
  })
  if (!headerSeen) throw new CsvFileError('empty', 'The file is empty.')
  if (dataRows === 0) throw new CsvFileError('empty', 'The file has a header row but no rows below it.')
  return { sha256: hash.digest('hex'), bytes, rows: dataRows, delimiter }
}
