import type { GraphPalette } from './graph-style'
import { FIT_LOOKS, type FitLook } from './relations'

/**
 * The theme's colours as the canvas needs them (plain rgb). A probe element
 * resolves nested custom properties the same way the page does.
 */
export function readGraphPalette(root: HTMLElement = document.body): GraphPalette {
  const probe = document.createElement('span')
  probe.style.display = 'none'
  root.append(probe)
  const resolve = (expression: string, fallback: string) => {
    probe.style.color = fallback
    probe.style.color = expression
    return getComputedStyle(probe).color || fallback
  }
  const looks = Object.fromEntries(
    (Object.keys(FIT_LOOKS) as FitLook[]).map((look) => [look, resolve(`var(${FIT_LOOKS[look].colourVar})`, '#555')]),
  ) as Record<FitLook, string>
  const palette: GraphPalette = {
    text: resolve('var(--p-text-color)', '#222'),
    surface: resolve('var(--p-content-background)', '#fff'),
    border: resolve('var(--p-text-muted-color)', '#777'),
    node: resolve('var(--p-content-hover-background)', '#eee'),
    centre: '#f4b860',
    centreText: '#1a3a38',
    looks,
  }
  probe.remove()
  return palette
}
