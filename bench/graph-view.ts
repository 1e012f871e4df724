/*
 * How the fit graph view copes with the biggest neighbourhood the server sends
 * (600 parts, 1400 links: the caps). Builds the client, starts the production
 * server, answers the neighbourhood request with a synthetic capped graph and
 * measures, in Debian's chromium: time until the layout settles, and frames
 * per second while the view is dragged and zoomed. Run: npm run bench:graph
 */
import { build } from 'vite'
import type { Neighbourhood } from '../shared/schemas/graph'
import { MAX_NEIGHBOURHOOD_EDGES, MAX_NEIGHBOURHOOD_NODES } from '../shared/schemas/graph'
import { PART_KINDS } from '../shared/schemas/part-kinds'
import { RELATIONS } from '../shared/schemas/fitment'
import { chromiumPath, launchBrowser, signInAs, startServer } from '../tests/helpers/browser'

function cappedNeighbourhood(): Neighbourhood {
  const id = (i: number) => `BN-${String(i).padStart(4, '0')}`
  const nodes = Array.from({ length: MAX_NEIGHBOURHOOD_NODES }, (_, i) => ({
    id: id(i),
    partNumber: id(i),
    name: `Bench part ${i}`,
    kind: PART_KINDS[i % PART_KINDS.length]!,
    family: 'BENCH',
    distance: i === 0 ? 0 : i < 40 ? 1 : 2,
  }))
  // A centre with 39 neighbours, each with a fan of parts two steps out, plus cross links.
  const edges = Array.from({ length: MAX_NEIGHBOURHOOD_EDGES }, (_, i) => {
    const source = i < 39 ? 0 : 1 + (i % 39)
    const target = i < 39 ? i + 1 : 40 + ((i * 7) % (MAX_NEIGHBOURHOOD_NODES - 40))
    return {
      id: `link-${i}`,
      source: id(source),
      target: id(target),
      type: 'link' as const,
      relation: RELATIONS[i % 3]!,
      review: 'approved' as const,
    }
  })
  return { centre: id(0), depth: 2, nodes, edges, capped: true, message: 'Showing the first 600 parts and 1400 links.' }
}

async function main() {
  if (!chromiumPath()) throw new Error("No chromium: install Debian's chromium or set CHROMIUM_PATH.")
  await build({ logLevel: 'warn' })
  const server = await startServer()
  const browser = await launchBrowser()
  try {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } })
    await signInAs(page, server.url, 'counter')
    const answer = JSON.stringify(cappedNeighbourhood())
    await page.route('**/api/graph/neighbourhood/**', (route) =>
      route.fulfill({ status: 200, contentType: 'application/json', body: answer }),
    )
    const runs: { settleMs: number; fps: number }[] = []
    for (let run = 0; run < 3; run++) {
      const started = Date.now()
      await page.goto(`${server.url}/graph/BN-0000?depth=2&run=${run}`)
      await page.locator('.graph-canvas[data-settled="true"]').waitFor({ timeout: 60_000 })
      const settleMs = Date.now() - started
      const box = (await page.locator('.graph-canvas').boundingBox())!
      // A string, not a function: tsx's name helpers do not exist inside the page.
      // Settled into a value or an error at once, so a failure cannot kill the run before the server is stopped.
      const frames = page
        .evaluate<number>(
          `new Promise((resolve) => {
        let count = 0
        const start = performance.now()
        const tick = () => {
          count++
          if (performance.now() - start < 2000) requestAnimationFrame(tick)
          else resolve((count * 1000) / (performance.now() - start))
        }
        requestAnimationFrame(tick)
      })`,
        )
        .then(
          (fps) => ({ fps }),
          (error: unknown) => ({ error }),
        )
      await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2)
      await page.mouse.down()
      for (let step = 0; step < 40; step++)
        await page.mouse.move(box.x + box.width / 2 + Math.sin(step / 4) * 200, box.y + box.height / 2 + step * 3)
      await page.mouse.up()
      for (let step = 0; step < 10; step++) await page.mouse.wheel(0, step < 5 ? -120 : 120)
      const counted = await frames
      if ('error' in counted) throw counted.error
      runs.push({ settleMs, fps: Math.round(counted.fps) })
    }
    console.log(
      `Capped neighbourhood: ${MAX_NEIGHBOURHOOD_NODES} parts + ${MAX_NEIGHBOURHOOD_EDGES} links = ${MAX_NEIGHBOURHOOD_NODES + MAX_NEIGHBOURHOOD_EDGES} elements`,
    )
    for (const [i, r] of runs.entries())
      console.log(`run ${i + 1}: laid out and drawn in ${r.settleMs} ms (page load included); ${r.fps} frames/s while dragging and zooming`)
  } finally {
    await browser.close()
    await server.stop()
  }
}

await main()
