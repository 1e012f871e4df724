import type { Page } from 'playwright-core'

type CyNode = { renderedPosition: () => { x: number; y: number } }
type CyHost = HTMLElement & { _cyreg?: { cy?: { $id: (id: string) => CyNode & { length: number } } } }

/** Waits until the fit graph has laid out its parts, so a click lands on the part aimed at. */
export async function waitForGraph(page: Page) {
  await page.locator('.graph-canvas[data-settled="true"]').waitFor({ timeout: 15_000 })
}

/** Where a part is drawn on the page, read from cytoscape's own registry on the canvas element. */
export async function nodePosition(page: Page, partNumber: string): Promise<{ x: number; y: number }> {
  const canvas = page.locator('.graph-canvas')
  const box = await canvas.boundingBox()
  if (!box) throw new Error('The graph canvas is not on the page.')
  const position = await canvas.evaluate((element, id) => {
    const node = (element as CyHost)._cyreg?.cy?.$id(id)
    return node && node.length > 0 ? node.renderedPosition() : null
  }, partNumber)
  if (!position) throw new Error(`${partNumber} is not drawn in the graph.`)
  return { x: box.x + position.x, y: box.y + position.y }
}
