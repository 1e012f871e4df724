import { writeFileSync } from 'node:fs'
import path from 'node:path'
import Papa from 'papaparse'
import { knownAttributes } from '../../shared/schemas/part-attributes'
import { PART_KINDS } from '../../shared/schemas/part-kinds'
import { MODIFICATIONS, RELATION_CODES, type Catalogue, type CataloguePart, type LinkSet } from './catalogue'
import { attributeCell } from './families'
import { seededRandom } from './random'

/** The link rows a links file holds, in the importer's column order. */
export type LinkFileRow = [from: string, to: string, relation: string, modifications: string, note: string, source: string]
export const LINK_HEADER = ['from_part', 'to_part', 'relation', 'modifications', 'note', 'source']
const NOTES = ['', '', '', '', 'Checked on the bench.', 'Fitted and run by a member shop.', 'Same mounting face; confirm the gasket.']

const snake = (name: string) => name.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`)

function partRow(part: CataloguePart, attributes: string[]): string[] {
  // Seeded by the serial, so a reman number carries the same figures as its original.
  const random = seededRandom(Number(part.number.split('-')[2]!.replace(/\D/g, '')))
  const yearFrom = part.family.yearFrom + random.int(4)
  const cells = attributes.map((name) => (random.next() < 0.08 ? '' : attributeCell(name, part.kind, part.family, random)))
  const notes = part.alias ? 'Exchange or superseding number for the same part.' : ''
  return [
    part.number,
    part.kind,
    part.name,
    part.family.code,
    String(yearFrom),
    String(yearFrom + 3 + random.int(8)),
    notes,
    part.casting,
    part.stamped,
    part.superseded,
    ...cells,
  ]
}

export function linkRows(parts: CataloguePart[], links: LinkSet, start = 0, end = links.length): LinkFileRow[] {
  const rows: LinkFileRow[] = []
  for (let i = start; i < end; i++) {
    const modification = links.modification[i]!
    rows.push([
      parts[links.from[i]!]!.number,
      parts[links.to[i]!]!.number,
      RELATION_CODES[links.relation[i]!]!,
      modification < 0 ? '' : MODIFICATIONS[modification]!,
      NOTES[i % NOTES.length]!,
      'import',
    ])
  }
  return rows
}

export function identityRows(catalogue: Catalogue): LinkFileRow[] {
  return catalogue.identities.map(([original, alias], i) => [
    catalogue.parts[original]!.number,
    catalogue.parts[alias]!.number,
    'identical',
    '',
    i % 2 === 0 ? 'Remanufactured exchange number.' : 'Superseding number for the same part.',
    'import',
  ])
}

function write(dir: string, name: string, header: string[], rows: string[][]): string {
  const file = path.join(dir, name)
  writeFileSync(file, Papa.unparse([header, ...rows]))
  return file
}

export type CatalogueFiles = { parts: string[]; links: string[]; identities: string; commit: string; small: string[] }

/** One parts file per kind and links files of at most `chunk` rows, as an editor would upload them. */
export function writeCatalogueFiles(
  dir: string,
  catalogue: Catalogue,
  options: { chunk: number; commitRows: number; smallImports: number },
): CatalogueFiles {
  const parts = PART_KINDS.flatMap((kind) => {
    const attributes = knownAttributes(kind).map((attribute) => attribute.name)
    const header = [
      'part_number',
      'kind',
      'name',
      'family',
      'year_from',
      'year_to',
      'notes',
      'casting_marks',
      'stamped_codes',
      'superseded_numbers',
      ...attributes.map(snake),
    ]
    const rows = catalogue.parts.filter((part) => part.kind === kind).map((part) => partRow(part, attributes))
    const files: string[] = []
    for (let start = 0; start < rows.length; start += options.chunk)
      files.push(write(dir, `parts-${kind}-${files.length + 1}.csv`, header, rows.slice(start, start + options.chunk)))
    return files
  })
  const links: string[] = []
  for (let start = 0; start < catalogue.links.length; start += options.chunk) {
    links.push(
      write(
        dir,
        `links-${links.length + 1}.csv`,
        LINK_HEADER,
        linkRows(catalogue.parts, catalogue.links, start, Math.min(start + options.chunk, catalogue.links.length)),
      ),
    )
  }
  const identities = write(dir, 'identities.csv', LINK_HEADER, identityRows(catalogue))
  const commit = write(dir, 'links-commit.csv', LINK_HEADER, linkRows(catalogue.parts, catalogue.extra, 0, options.commitRows))
  const small = Array.from({ length: options.smallImports }, (_, i) => {
    const start = options.commitRows + i * 100
    return write(dir, `links-100-${i + 1}.csv`, LINK_HEADER, linkRows(catalogue.parts, catalogue.extra, start, start + 100))
  })
  return { parts, links, identities, commit, small }
}
