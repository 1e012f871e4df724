import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import fc from 'fast-check'
import type { DataSource } from 'typeorm'
import { z } from 'zod'
import { afterAll, describe, expect, it } from 'vitest'
import { LINK_SOURCES } from '../../shared/schemas/fitment'
import { MARK_TYPES, normalisePartCode } from '../../shared/schemas/part'
import { attributeShapes } from '../../shared/schemas/part-attributes'
import { partInputSchema, type PartInput } from '../../shared/schemas/part-input'
import { PART_KINDS, type PartKind } from '../../shared/schemas/part-kinds'
import { snakeToCamel } from '../../server/imports/csv/part-row'
import { openDatabase } from '../../server/db/data-source'
import { linksCsv, partsCsv } from '../../server/imports/export.service'
import { FitGraphIndex } from '../../server/fitment/fit-graph'
import { ImportService } from '../../server/imports/import.service'
import { databaseOf } from '../../server/db/sqlite-connection'
import { insertIdentityRow, insertLinkRow } from '../../server/fitment/link-rows'
import { insertPartRows } from '../../server/catalogue/part-writer'

/*
 * Property: any valid catalogue, written by the ordinary writers, exported and
 * imported into an empty database, comes back identical.
 */

// Any text a spreadsheet cell may hold except NUL (a file holding NUL is refused as binary).
const text = (maxLength: number) => fc.string({ unit: 'grapheme', maxLength }).filter((value) => !value.includes('\u0000'))
const trimmed = (maxLength: number) =>
  text(maxLength)
    .map((value) => value.trim())
    .filter((value) => value.length > 0)

function valueFor(schema: z.ZodType): fc.Arbitrary<string | number | boolean> {
  if (schema instanceof z.ZodEnum) return fc.constantFrom(...(schema.options as string[]))
  if (schema instanceof z.ZodBoolean) return fc.boolean()
  if (schema instanceof z.ZodNumber) {
    return fc
      .oneof(fc.integer({ min: -5, max: 20 }), fc.double({ min: -5, max: 300, noNaN: true }))
      .filter((v) => schema.safeParse(v).success)
  }
  return fc.oneof(fc.constantFrom('M11x1.5', 'M10x1.25'), trimmed(12)).filter((v) => schema.safeParse(v).success)
}

const UNKNOWN_KEYS = ['finish', 'supplier_ref', 'bore_mm', 'thread']

function partFor(kind: PartKind): fc.Arbitrary<PartInput> {
  const shape = attributeShapes[kind] as Record<string, z.ZodType>
  const known = fc.record(Object.fromEntries(Object.entries(shape).map(([name, schema]) => [name, valueFor(schema)])), { requiredKeys: [] })
  // A column the kind knows is typed, so it cannot hold an unknown attribute of that kind.
  const unknownKeys = UNKNOWN_KEYS.filter((key) => !(snakeToCamel(key) in shape))
  const unknown = fc.dictionary(fc.constantFrom(...unknownKeys), trimmed(15), { maxKeys: 2 })
  const years = fc.tuple(fc.option(fc.integer({ min: 1900, max: 2100 })), fc.option(fc.integer({ min: 1900, max: 2100 })))
  const mark = fc.record({ type: fc.constantFrom(...MARK_TYPES), value: trimmed(10).filter((v) => !v.includes(';')) })
  return fc
    .record({
      partNumber: fc.stringMatching(/^[A-Z]{2}-[A-Z0-9]{1,6}$/),
      name: trimmed(30),
      family: fc.constantFrom('', 'TK18', 'TK20V', 'Service'),
      years,
      notes: text(40),
      known,
      unknown,
      marks: fc.uniqueArray(mark, { maxLength: 3, selector: (m) => `${m.type}:${m.value}` }),
      listPriceCents: fc.option(fc.integer({ min: 0, max: 100_000_000 })),
    })
    .map(({ years: [a, b], known, unknown, ...rest }) => {
      const [yearFrom, yearTo] = a !== null && b !== null && a > b ? [b, a] : [a, b]
      return partInputSchema.parse({ ...rest, kind, yearFrom, yearTo, attributes: { ...unknown, ...known } })
    })
}

const catalogueArb = fc
  .uniqueArray(fc.constantFrom(...PART_KINDS).chain(partFor), {
    minLength: 2,
    maxLength: 8,
    selector: (p) => normalisePartCode(p.partNumber),
  })
  .chain((parts) =>
    fc.record({
      parts: fc.constant(parts),
      links: fc.uniqueArray(
        fc
          .record({
            a: fc.nat({ max: parts.length - 1 }),
            b: fc.nat({ max: parts.length - 1 }),
            relation: fc.constantFrom('fits', 'fits-with-modification', 'does-not-fit', 'identical'),
            mods: fc.uniqueArray(fc.constantFrom('oil-restrictor-fit', 'custom-shim', 'bracket-trim'), { minLength: 1, maxLength: 2 }),
            note: text(40),
            source: fc.constantFrom(...LINK_SOURCES),
          })
          .filter((link) => link.a !== link.b),
        { maxLength: 10, selector: (link) => [link.a, link.b].sort().join(':') },
      ),
    }),
  )
type Catalogue = typeof catalogueArb extends fc.Arbitrary<infer T> ? T : never

async function writeCatalogue(dataSource: DataSource, { parts, links }: Catalogue) {
  const ids = await databaseOf(dataSource).transaction((db) => insertPartRows(db, parts, null, new Date()))
  await databaseOf(dataSource).transaction(async (db) => {
    for (const link of links) {
      const partIds: [number, number] = [ids.get(parts[link.a]!.partNumber)!, ids.get(parts[link.b]!.partNumber)!]
      if (link.relation === 'identical') await insertIdentityRow(db, { partIds, note: link.note, source: link.source, batchId: null })
      else {
        const modifications = link.relation === 'fits-with-modification' ? link.mods : []
        await insertLinkRow(db, {
          partIds,
          relation: link.relation,
          modifications,
          note: link.note,
          source: link.source,
          status: 'approved',
          batchId: null,
        })
      }
    }
  })
}

/** The catalogue by natural keys only: ids and timestamps may differ between two databases. */
async function readCatalogue(dataSource: DataSource) {
  const parts = (await dataSource.query(
    'SELECT partNumber, kind, name, family, yearFrom, yearTo, notes, attributes, listPriceCents FROM part ORDER BY partNumber',
  )) as {
    attributes: string
  }[]
  const pair = `CASE WHEN a.partNumber < b.partNumber THEN a.partNumber || ' ' || b.partNumber ELSE b.partNumber || ' ' || a.partNumber END`
  return {
    parts: parts.map((part) => ({ ...part, attributes: JSON.parse(part.attributes) as unknown })),
    marks: await dataSource.query('SELECT p.partNumber, m.type, m.value FROM part_mark m JOIN part p ON p.id = m.partId ORDER BY 1, 2, 3'),
    links: await dataSource.query(
      `SELECT ${pair} AS pair, l.relation, l.note, l.source, l.status,
         (SELECT group_concat(name, ';') FROM (SELECT m.name FROM link_modification lm JOIN modification m ON m.id = lm.modificationId WHERE lm.linkId = l.id ORDER BY m.name)) AS mods
       FROM link l JOIN part a ON a.id = l.partAId JOIN part b ON b.id = l.partBId ORDER BY 1`,
    ),
    identities: await dataSource.query(
      `SELECT ${pair} AS pair, i.note, i.source FROM part_identity i JOIN part a ON a.id = i.partAId JOIN part b ON b.id = i.partBId ORDER BY 1`,
    ),
    modifications: await dataSource.query('SELECT name, status FROM modification ORDER BY name'),
  }
}

const dir = mkdtempSync(path.join(tmpdir(), 'fitwright-round-trip-'))
afterAll(() => rmSync(dir, { recursive: true, force: true }))

describe('export then import into an empty database (property, fast-check)', () => {
  it('gives back an identical catalogue for any valid catalogue', async () => {
    await fc.assert(
      fc.asyncProperty(catalogueArb, async (catalogue) => {
        const source = await openDatabase(':memory:')
        const target = await openDatabase(':memory:')
        try {
          await writeCatalogue(source, catalogue)
          const imports = new ImportService(target, { maxRows: 1000 }, new FitGraphIndex(target))
          for (const type of ['parts', 'links'] as const) {
            // A links file of no links is refused as empty, so there is nothing to import.
            if (type === 'links' && catalogue.links.length === 0) continue
            const csv = type === 'parts' ? await partsCsv(databaseOf(source)) : await linksCsv(databaseOf(source))
            const file = path.join(dir, `${type}.csv`)
            writeFileSync(file, csv)
            const user = { id: null, name: 'test' }
            await imports.run({
              filePath: file,
              fileName: `${type}.csv`,
              fileSize: Buffer.byteLength(csv),
              type,
              mode: 'commit',
              validRowsOnly: false,
              user,
            })
          }
          expect(await readCatalogue(target)).toEqual(await readCatalogue(source))
        } finally {
          await source.destroy()
          await target.destroy()
        }
      }),
      { numRuns: 40 },
    )
  }, 120_000)
})
