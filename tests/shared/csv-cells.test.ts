import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { neutraliseCell, restoreCell } from '../../shared/csv-cells'
import { detectDelimiter } from '../../server/imports/csv/csv-stream'

describe('neutraliseCell and restoreCell', () => {
  it.each([
    ['=SUM(A1)', "'=SUM(A1)"],
    ['+44 1632', "'+44 1632"],
    ['-3', "'-3"],
    ['@cmd', "'@cmd"],
    ['\tx', "'\tx"],
    ['\rx', "'\rx"],
    ["'=x", "''=x"],
    ["'plain", "'plain"],
    ['plain', 'plain'],
  ])('writes %j as %j', (value, written) => {
    expect(neutraliseCell(value)).toBe(written)
    expect(restoreCell(written)).toBe(value)
  })

  it('never writes a cell a spreadsheet would run, and always reads back the value (property)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme' }), fc.constantFrom('', '=', '+', '-', '@', '\t', '\r', "'", "''", "'="), (tail, head) => {
        const value = head + tail
        const written = neutraliseCell(value)
        expect(written).not.toMatch(/^[=+\-@\t\r]/)
        expect(restoreCell(written)).toBe(value)
      }),
    )
  })
})

describe('detectDelimiter', () => {
  it.each([
    ['a,b,c\n1,2,3\n', ','],
    ['a;b\n1;2\n', ';'],
    ['a\tb\n', '\t'],
    ['"x;y;z",b,c\n', ','],
    ['\n\na;b;c\n', ';'],
    ['single\n1\n', ','],
  ])('reads the delimiter of %j from its header line as %j', (text, delimiter) => {
    expect(detectDelimiter(text)).toBe(delimiter)
  })
})
