import type { NodeSingular, StylesheetJson } from 'cytoscape'
import { FIT_LOOKS, type FitLook } from './relations'

/** Colours read from the theme, so the canvas follows light and dark like the rest of the page. */
export type GraphPalette = {
  text: string
  surface: string
  border: string
  node: string
  centre: string
  centreText: string
  looks: Record<FitLook, string>
}

/** Node width from its longest label line (monospace, 11 px: about 6.7 px a character). */
function labelWidth(label: string): number {
  return Math.max(...label.split('\n').map((line) => line.length)) * 6.7 + 18
}

const FONT = '"Roboto Mono", "DejaVu Sans Mono", ui-monospace, monospace'

/**
 * Our own visual language: relation by line style, a shape at the middle of
 * the edge and a text label; colour only repeats what those already say.
 * Proposed links are thinner and half-transparent and say "(proposed)".
 */
export function graphStylesheet(palette: GraphPalette, large: boolean): StylesheetJson {
  const looks = (Object.keys(FIT_LOOKS) as FitLook[]).map((look) => {
    const style = FIT_LOOKS[look]
    const colour = palette.looks[look]
    // Canvas edges have no double line: a surface-coloured line with an outline draws one.
    const line =
      style.line === 'double'
        ? { 'line-style': 'solid', 'line-color': palette.surface, 'line-outline-width': 1.8, 'line-outline-color': colour, width: 3.5 }
        : { 'line-style': style.line, 'line-color': colour, width: 2.5 }
    return {
      selector: `edge.look-${look}`,
      style: {
        ...line,
        // The marker sits at both ends, where no label covers it.
        'source-arrow-shape': style.marker,
        'target-arrow-shape': style.marker,
        'source-arrow-color': colour,
        'target-arrow-color': colour,
        'source-arrow-fill': look === 'fits-with-modification' ? 'hollow' : 'filled',
        'target-arrow-fill': look === 'fits-with-modification' ? 'hollow' : 'filled',
        ...(style.line === 'dashed' ? { 'line-dash-pattern': [9, 5] } : {}),
        ...(style.line === 'dotted' ? { 'line-dash-pattern': [2, 4] } : {}),
      },
    }
  })
  return [
    {
      selector: 'node',
      style: {
        shape: 'round-rectangle',
        // Big views skip the per-node label measuring: every part number there has the same width.
        width: large ? 120 : (node: NodeSingular) => labelWidth(String(node.data('label'))),
        height: 34,
        label: 'data(label)',
        'text-wrap': 'wrap',
        'text-valign': 'center',
        'text-halign': 'center',
        'font-family': FONT,
        'font-size': 11,
        color: palette.text,
        'background-color': palette.node,
        'border-width': 1.5,
        'border-color': palette.border,
        ...(large ? { 'min-zoomed-font-size': 7 } : {}),
      },
    },
    { selector: 'node.distance-2', style: { 'border-style': 'dashed' } },
    {
      selector: 'node.centre',
      style: { 'background-color': palette.centre, color: palette.centreText, 'border-width': 3, 'font-weight': 'bold' },
    },
    { selector: 'node:selected', style: { 'border-width': 4, 'border-color': palette.text } },
    {
      selector: 'edge',
      style: {
        // Straight edges draw much faster than curves; in big views an edge says its relation in
        // words when it or one of its parts is pointed at or selected (line and markers always do).
        'curve-style': large ? 'straight' : 'bezier',
        label: large ? '' : 'data(label)',
        'font-family': FONT,
        'font-size': 10,
        color: palette.text,
        'text-background-color': palette.surface,
        'text-background-opacity': 0.9,
        'text-background-padding': '2px',
        'arrow-scale': 1.6,
      },
    },
    ...looks,
    { selector: 'edge.proposed', style: { opacity: 0.6, width: 1.5 } },
    { selector: 'edge:selected', style: { width: 5, 'z-index': 10 } },
    { selector: 'edge.labelled, edge:selected', style: { label: 'data(label)', 'z-index': 10 } },
  ]
}
