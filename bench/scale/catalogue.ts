import { matingSlots } from '../../shared/build-template'
import { PART_KINDS, PART_KIND_LABELS, type PartKind } from '../../shared/schemas/part-kinds'
import { inventFamilies, type Family } from './families'
import { seededRandom, zipfSampler, type Random } from './random'

/** Two-letter kind codes in part numbers, e.g. GX-HD-004711. */
export const KIND_CODES: Record<PartKind, string> = {
  block: 'BL',
  head: 'HD',
  'head-gasket': 'HG',
  'head-bolt': 'HB',
  distributor: 'DS',
  'ignition-leads': 'IL',
  ecu: 'EC',
  harness: 'WH',
  'intake-manifold': 'IM',
  'intake-gasket': 'IG',
  'exhaust-manifold': 'EM',
  'exhaust-gasket': 'EG',
  'fuel-rail': 'FR',
  injector: 'IN',
  'cam-gear': 'CG',
  'timing-belt': 'TB',
  'crank-pulley': 'CP',
  'oil-restrictor': 'OR',
  other: 'XA',
}
/** Parts shared by many engines: they take the top ranks of the link spread. */
const HUB_KINDS = new Set<PartKind>(['timing-belt', 'head-gasket', 'intake-gasket', 'exhaust-gasket', 'oil-restrictor', 'head-bolt'])
const CAST_KINDS = new Set<PartKind>(['block', 'head', 'distributor', 'intake-manifold', 'exhaust-manifold', 'cam-gear'])
const VARIANTS = ['', '', '', ', early', ', late', ', uprated', ', economy', ', heavy-duty', ', export']
export const MODIFICATIONS = [
  'hardened-washer-stack',
  'distributor-internals-transfer',
  'vvl-leads-insulate',
  'oil-restrictor-fit',
  'oil-restrictor-remove-duplicate',
  'injector-resistor-pack',
] as const
export const RELATION_CODES = ['fits', 'fits-with-modification', 'does-not-fit'] as const

export type CataloguePart = {
  number: string
  kind: PartKind
  family: Family
  name: string
  casting: string
  stamped: string
  superseded: string
  /** A remanufactured or superseding number, declared identical to another part. */
  alias: boolean
}
/** Links as parallel arrays of part indexes, relation and modification codes (-1 for none). */
export type LinkSet = { from: Int32Array; to: Int32Array; relation: Uint8Array; modification: Int8Array; length: number }
export type Catalogue = { parts: CataloguePart[]; families: Family[]; links: LinkSet; extra: LinkSet; identities: [number, number][] }

function inventParts(count: number, families: Family[], random: Random): CataloguePart[] {
  const aliases = Math.round(count * 0.05)
  const parts: CataloguePart[] = []
  for (let i = 0; i < count - aliases; i++) {
    const kind = random.next() < 0.04 ? 'other' : PART_KINDS[random.int(PART_KINDS.length - 1)]!
    const family = random.pick(families)
    const number = `GX-${KIND_CODES[kind]}-${String(i + 1).padStart(6, '0')}`
    const digits = family.code.replace(/\D/g, '')
    parts.push({
      number,
      kind,
      family,
      name: `${family.code} ${PART_KIND_LABELS[kind].toLowerCase()}${random.pick(VARIANTS)}`,
      casting: CAST_KINDS.has(kind) ? `${KIND_CODES[kind][0]}${digits}-${1000 + random.int(9000)}` : '',
      stamped: kind.endsWith('gasket') || kind === 'ecu' ? `${KIND_CODES[kind]}${digits}-${random.int(90) + 10}` : '',
      superseded: random.next() < 0.03 ? `${number}A` : '',
      alias: false,
    })
  }
  return parts
}

function addAliases(parts: CataloguePart[], count: number, random: Random): [number, number][] {
  const identities: [number, number][] = []
  const taken = new Set<number>()
  const base = parts.length
  while (identities.length < count) {
    const original = random.int(base)
    if (taken.has(original)) continue
    taken.add(original)
    const part = parts[original]!
    const reman = identities.length % 2 === 0
    parts.push({
      ...part,
      number: `${part.number}${reman ? 'R' : 'S'}`,
      name: `${part.name}${reman ? ', remanufactured' : ', superseding number'}`,
      superseded: '',
      alias: true,
    })
    identities.push([original, parts.length - 1])
  }
  return identities
}

const emptyLinks = (size: number): LinkSet => ({
  from: new Int32Array(size),
  to: new Int32Array(size),
  relation: new Uint8Array(size),
  modification: new Int8Array(size),
  length: 0,
})

/**
 * Distinct pairs with a skewed spread: one end drawn by rank (hub kinds
 * first), the other uniformly among the parts of a kind it mates with.
 */
function inventLinks(parts: CataloguePart[], sizes: [number, number], random: Random): [LinkSet, LinkSet] {
  const base = parts.filter((part) => !part.alias).length
  const byKind = new Map<PartKind, number[]>(PART_KINDS.map((kind) => [kind, []]))
  for (let i = 0; i < base; i++) byKind.get(parts[i]!.kind)!.push(i)
  const order = Array.from({ length: base }, (_, i) => i).sort(
    (a, b) =>
      Number(HUB_KINDS.has(parts[b]!.kind)) - Number(HUB_KINDS.has(parts[a]!.kind)) ||
      ((a * 2654435761) % 1000) - ((b * 2654435761) % 1000),
  )
  const rank = zipfSampler(base, 0.8, random)
  const seen = new Set<number>()
  const otherEnd = (a: number): number => {
    const kinds = matingSlots(parts[a]!.kind)
    const candidates = kinds.length ? byKind.get(random.pick(kinds))! : []
    return candidates.length ? random.pick(candidates) : random.int(base)
  }
  const sets = sizes.map(emptyLinks) as [LinkSet, LinkSet]
  for (const set of sets) {
    for (let i = 0; i < set.from.length; i++) {
      let a: number
      let b: number
      for (let attempt = 0; ; attempt++) {
        a = attempt < 30 ? order[rank()]! : random.int(base)
        b = attempt < 30 ? otherEnd(a) : random.int(base)
        if (a !== b && !seen.has(Math.min(a, b) * base + Math.max(a, b))) break
      }
      seen.add(Math.min(a, b) * base + Math.max(a, b))
      const roll = random.next()
      set.from[i] = a
      set.to[i] = b
      set.relation[i] = roll < 0.8 ? 0 : roll < 0.9 ? 1 : 2
      set.modification[i] = roll >= 0.8 && roll < 0.9 ? random.int(MODIFICATIONS.length) : -1
      set.length++
    }
  }
  return sets
}

/** The whole invented catalogue; `extraLinks` are new pairs kept back for the write measurements. */
export function inventCatalogue(size: { parts: number; links: number; extraLinks: number }): Catalogue {
  const random = seededRandom(20260112)
  const families = inventFamilies(Math.max(10, Math.min(300, Math.round(size.parts / 40))), random)
  const parts = inventParts(size.parts, families, random)
  const identities = addAliases(parts, size.parts - parts.length, random)
  const [links, extra] = inventLinks(parts, [size.links, size.extraLinks], random)
  return { parts, families, links, extra, identities }
}
