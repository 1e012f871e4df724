import { monitorEventLoopDelay, performance } from 'node:perf_hooks'
import { z } from 'zod'
import type { BareQueries } from './bare-queries'
import type { Client } from './http'
import type { PickedPart } from './picks'
import { figureLine, latencyLine, type Line } from './report'
import { failureReason, type Sample } from './stats'

const fitsAnswer = z.object({
  groups: z.array(
    z.object({
      total: z.number(),
      results: z.array(z.object({ part: z.object({ partNumber: z.string() }), relation: z.string(), decidedBy: z.string() })),
    }),
  ),
})
const EDITS = 20
const PAGE_SIZE = 200

type Edit = { linkId: number; part: string; other: string; otherKind: string }

function linkToEdit(bare: BareQueries, part: PickedPart): Edit | undefined {
  return bare.db
    .prepare(
      `SELECT l.id AS linkId, ? AS part, o.partNumber AS other, o.kind AS otherKind FROM link l JOIN part o ON o.id = CASE WHEN l.partAId = ? THEN l.partBId ELSE l.partAId END
       WHERE (l.partAId = ? OR l.partBId = ?) AND l.relation = 'fits' AND l.status = 'approved' LIMIT 1`,
    )
    .get(part.number, part.id, part.id, part.id) as Edit | undefined
}

/** Whether the edited link answers does-not-fit, decided by the link, in its part's what-fits pages of the other part's kind. */
async function editShown(counter: Client, edit: Edit): Promise<boolean> {
  const base = `/api/parts/${encodeURIComponent(edit.part)}/fits?kind=${edit.otherKind}&relation=does-not-fit&inferred=0&pageSize=${PAGE_SIZE}`
  for (let page = 1; ; page++) {
    const answer = fitsAnswer.parse(await counter.get(`${base}&page=${page}`))
    const results = answer.groups.flatMap((group) => group.results)
    if (results.some((result) => result.part.partNumber === edit.other && result.decidedBy === 'link')) return true
    const total = Math.max(0, ...answer.groups.map((group) => group.total))
    if (results.length === 0 || page * PAGE_SIZE >= total) return false
  }
}

/**
 * A single-link edit as an editor makes it (PATCH one link to does-not-fit),
 * timed as event-loop busy time and the longest event-loop stall while the
 * request ran (client and server share this process's loop), then the next
 * what-fits answer for that part: how long it takes and whether it shows the edit.
 */
export async function measureEdits(editor: Client, counter: Client, bare: BareQueries, parts: PickedPart[]): Promise<Line[]> {
  const busy: Sample = { times: [] }
  const stall: Sample = { times: [] }
  const next: Sample = { times: [] }
  let shown = 0
  const edits = parts
    .slice(-EDITS)
    .map((part) => linkToEdit(bare, part))
    .filter((edit): edit is Edit => edit !== undefined)
  for (const edit of edits) {
    const delay = monitorEventLoopDelay({ resolution: 1 })
    try {
      delay.enable()
      const before = performance.eventLoopUtilization()
      await editor.send('PATCH', `/api/links/${edit.linkId}`, { relation: 'does-not-fit' })
      busy.times.push(performance.eventLoopUtilization(before).active)
      delay.disable()
      stall.times.push(delay.max / 1e6)
      const started = performance.now()
      await counter.get(`/api/parts/${encodeURIComponent(edit.part)}/fits`)
      next.times.push(performance.now() - started)
      if (await editShown(counter, edit)) shown++
    } catch (error) {
      delay.disable()
      busy.failure = stall.failure = next.failure = failureReason(error)
      break
    }
  }
  return [
    latencyLine('single-link edit, event-loop busy', busy, null, { p95: 5 }),
    latencyLine('single-link edit, longest stall', stall, null, {}),
    latencyLine('what fits right after the edit', next, null, {}),
    figureLine(
      'edit visible in the next answer',
      `${shown} of ${edits.length}`,
      '',
      '',
      'every edit',
      edits.length > 0 && shown === edits.length,
    ),
  ]
}
