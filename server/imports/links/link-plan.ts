import type { Database } from '../../db/database'
import type { FieldChange, ImportIssue } from '../../../shared/schemas/imports'
import type { LinkSource, Relation } from '../../../shared/schemas/fitment'
import { unknownPartMessages } from '../unknown-part'
import { ChangeList } from '../import-change-list'
import { loadLinkCatalogue, type IdentityRecord, type StoredLink } from './link-catalogue'
export type { StoredLink } from './link-catalogue'
import { isFitRelation, rowsOf, type LinkEntry, type LinkRows } from './link-rows'

/** Rows whose parts and pairs are read together, a chunk of the file at a time. */
const PREFETCH_ROWS = 2000

export type LinkValues = { relation: Relation; modifications: string[]; note: string; source: LinkSource }

export type LinksPlan = {
  changes: ChangeList
  issues: ImportIssue[]
  modificationIds: Map<string, number>
  newModifications: string[]
  linkCreates: { a: number; b: number; values: LinkValues }[]
  linkUpdates: { stored: StoredLink; values: LinkValues }[]
  linkDeletes: StoredLink[]
  identityCreates: { a: number; b: number; note: string; source: LinkSource }[]
  identityUpdates: { stored: IdentityRecord; note: string; source: LinkSource }[]
  identityDeletes: IdentityRecord[]
}

type Shown = { relation: string; modifications: string; note: string; source: string; review: string }
const NOTHING: Shown = { relation: '', modifications: '', note: '', source: '', review: '' }

function shownLink(link: StoredLink | undefined, identity: IdentityRecord | undefined): Shown {
  if (link)
    return {
      relation: link.record.relation,
      modifications: link.names.join('; '),
      note: link.record.note,
      source: link.record.source,
      review: link.record.status,
    }
  if (identity) return { relation: 'identical', modifications: '', note: identity.note, source: identity.source, review: '' }
  return NOTHING
}

function fieldChanges(before: Shown, after: Shown): FieldChange[] {
  return (Object.keys(after) as (keyof Shown)[])
    .filter((field) => before[field] !== after[field])
    .map((field) => ({ field, before: before[field], after: after[field] }))
}

/**
 * Weighs the checked pairs against the catalogue as it is now. A pair holds one
 * relation: importing `identical` for a pair replaces its approved fit link,
 * and a fit relation replaces an identity. Proposed and rejected links are
 * review items, not catalogue, so `identical` leaves them be. Runs once per
 * row of very large files, so it only builds change descriptions it will list.
 */
export async function planLinks(db: Database, rows: LinkRows): Promise<LinksPlan> {
  const catalogue = await loadLinkCatalogue(db)
  const plan: LinksPlan = {
    changes: new ChangeList(),
    issues: [],
    modificationIds: catalogue.modificationIds,
    newModifications: [],
    linkCreates: [],
    linkUpdates: [],
    linkDeletes: [],
    identityCreates: [],
    identityUpdates: [],
    identityDeletes: [],
  }
  const unknownPart = unknownPartMessages(db)
  const newNames = new Set<string>()
  const issues = rows.issues.clone()
  const reject = (entry: LinkEntry, column: string, message: string) => {
    for (const row of rowsOf(entry)) issues.add(row, column, message)
  }
  const missing = async (entry: LinkEntry, column: 'from_part' | 'to_part', number: string) => {
    reject(entry, column, await unknownPart(number))
    return undefined
  }
  // Found parts and pairs come back without a promise (see the catalogue's memo): the loop awaits only what it must read.
  const partId = (entry: LinkEntry, column: 'from_part' | 'to_part', number: string): number | undefined | Promise<number | undefined> => {
    const id = catalogue.partIds.get(number)
    if (id instanceof Promise) return id.then((found) => found ?? missing(entry, column, number))
    return id ?? missing(entry, column, number)
  }

  const entries = [...rows.entries()]
  for (const [index, entry] of entries.entries()) {
    if (index % PREFETCH_ROWS === 0) await catalogue.prefetch(entries.slice(index, index + PREFETCH_ROWS))
    const fromLookup = partId(entry, 'from_part', entry.from)
    const from = fromLookup instanceof Promise ? await fromLookup : fromLookup
    const toLookup = partId(entry, 'to_part', entry.to)
    const to = toLookup instanceof Promise ? await toLookup : toLookup
    if (from === undefined || to === undefined) continue
    const a = from < to ? from : to
    const b = from < to ? to : from
    const pair = `${a}:${b}`
    const linkLookup = catalogue.links.get(pair)
    const link = linkLookup instanceof Promise ? await linkLookup : linkLookup
    const identityLookup = catalogue.identities.get(pair)
    const identity = identityLookup instanceof Promise ? await identityLookup : identityLookup
    let after: Shown
    let before: Shown

    if (!isFitRelation(entry.relation)) {
      if (entry.modifications?.length) {
        reject(entry, 'modifications', 'Two identical parts take no modifications; leave modifications empty.')
        continue
      }
      const approved = link?.record.status === 'approved' ? link : undefined
      const note = entry.note ?? identity?.note ?? ''
      const source = entry.source ?? identity?.source ?? 'import'
      before = identity ? shownLink(undefined, identity) : shownLink(approved, undefined)
      after = { relation: 'identical', modifications: '', note, source, review: '' }
      if (approved) plan.linkDeletes.push(approved)
      if (!identity) plan.identityCreates.push({ a, b, note, source })
      else if (identity.note !== note || identity.source !== source) plan.identityUpdates.push({ stored: identity, note, source })
      if (identity && approved) before = { ...before, relation: `identical, ${approved.record.relation}` }
    } else {
      const values: LinkValues = {
        relation: entry.relation,
        modifications: entry.modifications ?? link?.names ?? [],
        note: entry.note ?? link?.record.note ?? '',
        source: entry.source ?? link?.record.source ?? 'import',
      }
      const needsMods = values.relation === 'fits-with-modification'
      if (needsMods !== values.modifications.length > 0) {
        const message = needsMods
          ? 'fits-with-modification needs at least one modification.'
          : `Modifications go with fits-with-modification only; this row says ${values.relation}.`
        reject(entry, 'modifications', message)
        continue
      }
      before = shownLink(link, identity)
      after = {
        relation: values.relation,
        modifications: values.modifications.join('; '),
        note: values.note,
        source: values.source,
        review: 'approved',
      }
      if (identity) plan.identityDeletes.push(identity)
      if (identity && link) before = { ...before, relation: `${link.record.relation}, identical` }
      if (!link) plan.linkCreates.push({ a, b, values })
      else if (fieldChanges(shownLink(link, undefined), after).length) plan.linkUpdates.push({ stored: link, values })
      for (const name of values.modifications) if (!plan.modificationIds.has(name)) newNames.add(name)
    }

    plan.changes.repeats(entry.repeats?.length ?? 0)
    if (before === NOTHING)
      plan.changes.create(
        entry.row,
        () => `${entry.from} – ${entry.to}`,
        () => fieldChanges(NOTHING, after),
      )
    else plan.changes.compare(entry.row, `${entry.from} – ${entry.to}`, fieldChanges(before, after))
  }
  plan.newModifications = [...newNames].sort()
  plan.changes.rejected(issues.count)
  plan.issues = issues.sorted()
  return plan
}
