import { monitorEventLoopDelay, performance } from 'node:perf_hooks'
import { z } from 'zod'
import type { BareQueries } from './bare-queries'
import type { Client } from './http'
import type { PickedPart } from './picks'
import { figureLine, latencyLine, type Line } from './report'
import { failureReason, type Sample } from './stats'

const fitsAnswer = z.object({
  results: z.array(z.object({ part: z.object({ partNumber: z.string() }), relation: z.string(), decidedBy: z.string() })),
})
const EDITS = 5

type Edit = { linkId: number; part: string; other: string }

function linkToEdit(bare: BareQueries, part: PickedPart): Edit | undefined {
  return bare.db
    .prepare(
      `SELECT l.id AS linkId, ? AS part, o.partNumber AS other FROM link l JOIN part o ON o.id = CASE WHEN l.partAId = ? THEN l.partBId ELSE l.partAId END
       WHERE (l.partAId = ? OR l.partBId = ?) AND l.relation = 'fits' AND l.status = 'approved' LIMIT 1`,
    )
    .get(part.number, part.id, part.id, part.id) as Edit | undefined
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
      const answer = fitsAnswer.parse(await counter.get(`/api/parts/${encodeURIComponent(edit.part)}/fits`))
      next.times.push(performance.now() - started)
      if (
        answer.results.some(
          (result) => result.part.partNumber === edit.other && result.relation === 'does-not-fit' && result.decidedBy === 'link',
        )
      )
        shown++
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
