import type { SlotId } from '../../shared/build-template'
import { parseMetricThread, type PartAttributes } from '../../shared/schemas/part-attributes'
import type { PartKind } from '../../shared/schemas/part-kinds'
import type { FitGraph } from './fit-graph'
import type { CompanionPart, Companions } from '../reasoning/figures-ignition'

type Parts = Partial<Record<SlotId, { attributes: PartAttributes }>>

/** Catalogue parts of a kind whose attributes pass `keep`, read from the graph's rule classes (no table read). */
function partsWhere(graph: FitGraph, kind: PartKind, keep: (attributes: PartAttributes) => boolean): CompanionPart[] {
  const found: CompanionPart[] = []
  for (const id of graph.partsOfKind(kind)) {
    const { attributes } = graph.ruleClasses.input(graph.ruleClasses.classOf(id))
    if (keep(attributes)) found.push({ partNumber: graph.partNumberOf(id), attributes })
  }
  return found
}

type Memo = { distributors: number; others: number; byPair: Map<string, Companions> }
/** Companions by head mount and distributor flange, per graph, until a distributor or an `other` part changes. */
const memos = new WeakMap<FitGraph, Memo>()

/**
 * The parts a build implies without a slot: where the distributor's flange
 * differs from the head's mount, the housings its internals could move into
 * or the adapter plates a sealed body could sit on; under head bolts, the
 * hardened washers the catalogue stocks for their thread.
 */
export function findCompanions(graph: FitGraph, parts: Parts): Companions {
  return { ...distributorCompanions(graph, parts), ...washerCompanions(graph, parts) }
}

function remembered(graph: FitGraph, key: string, find: () => Companions): Companions {
  const memo = memoOf(graph)
  let companions = memo.byPair.get(key)
  if (!companions) {
    companions = find()
    memo.byPair.set(key, companions)
  }
  return companions
}

function distributorCompanions(graph: FitGraph, parts: Parts): Companions {
  const mount = parts.head?.attributes.distributorMount
  const distributor = parts.distributor?.attributes
  const flange = distributor?.mountPattern
  if (!distributor || typeof mount !== 'string' || typeof flange !== 'string' || mount === flange) return {}
  const transfer = distributor.internalsTransferable === true
  return remembered(graph, `${mount}|${flange}|${transfer}`, () =>
    transfer ? housingsFor(graph, mount) : adaptersFor(graph, flange, mount),
  )
}

/** Only a head with boss heights per position asks: the other heads' bolts are judged on one boss height. */
function washerCompanions(graph: FitGraph, parts: Parts): Companions {
  const thread = parseMetricThread(String(parts['head-bolt']?.attributes.thread ?? ''))
  if (!thread || parts.head?.attributes.bossHeightsMm === undefined) return {}
  return remembered(graph, `washers|${thread.diameterMm}`, () => ({ headBoltWashers: washersFor(graph, thread.diameterMm) }))
}

/** Washers and spacers whose hole takes the bolt (up to 1 mm over its diameter), thinnest first. */
function washersFor(graph: FitGraph, diameterMm: number): CompanionPart[] {
  const hole = (a: PartAttributes) => Number(a.innerDiameterMm)
  return partsWhere(graph, 'other', (a) => Number(a.thicknessMm) > 0 && hole(a) >= diameterMm && hole(a) <= diameterMm + 1).sort(
    (a, b) => Number(a.attributes.thicknessMm) - Number(b.attributes.thicknessMm),
  )
}

/** Which catalogue state the companions were found in, for caches of judgements that used them. */
export function companionsRevision(graph: FitGraph): string {
  return `${graph.revisionOfKind('distributor')}.${graph.revisionOfKind('other')}`
}

function memoOf(graph: FitGraph): Memo {
  const distributors = graph.revisionOfKind('distributor')
  const others = graph.revisionOfKind('other')
  let memo = memos.get(graph)
  if (!memo || memo.distributors !== distributors || memo.others !== others) {
    memo = { distributors, others, byPair: new Map() }
    memos.set(graph, memo)
  }
  return memo
}

function housingsFor(graph: FitGraph, mount: string): Companions {
  return { distributorHousings: partsWhere(graph, 'distributor', (a) => a.mountPattern === mount) }
}

function adaptersFor(graph: FitGraph, flange: string, mount: string): Companions {
  const thickness = (part: CompanionPart) => Number(part.attributes.thicknessMm)
  const adapters = partsWhere(graph, 'other', (a) => a.adaptsFromMount === flange && a.adaptsToMount === mount)
  return { distributorAdapters: adapters.sort((a, b) => thickness(a) - thickness(b)) }
}
