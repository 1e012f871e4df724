import { describe, expect, it } from 'vitest'
import { FitGraph, type FitDetails } from '../../server/fitment/fit-graph'

const noDetails: FitDetails = { links: async () => new Map(), identities: async () => new Map() }
const numbers = (graph: FitGraph, ids: readonly number[]) => ids.map((id) => graph.partNumberOf(id))

describe('the fit graph’s rule classes (parts by what the pair rules read)', () => {
  it('gives parts with the same attributes and last year one class, and a different year or attribute another', () => {
    const graph = new FitGraph(noDetails)
    graph.setPart(1, 'ZX-HG-2', 'head-gasket', '{"boreMm":86}', 2000)
    graph.setPart(2, 'ZX-HG-1', 'head-gasket', '{"boreMm":86}', 2000)
    graph.setPart(3, 'ZX-HG-3', 'head-gasket', '{"boreMm":86}', 1997)
    graph.setPart(4, 'ZX-HG-4', 'head-gasket', '{"boreMm":84.5}', 2000)
    const classes = graph.ruleClasses
    expect(classes.classOf(1)).toBe(classes.classOf(2))
    expect(new Set([1, 3, 4].map((id) => classes.classOf(id))).size).toBe(3)
    expect(classes.input(classes.classOf(3))).toEqual({ attributes: { boreMm: 86 }, yearTo: 1997 })
  })

  it('keeps each kind’s parts in part-number order through renumbering, a change of kind and a removal', () => {
    const graph = new FitGraph(noDetails)
    graph.setPart(1, 'ZX-HG-3', 'head-gasket')
    graph.setPart(2, 'ZX-HG-1', 'head-gasket')
    graph.setPart(3, 'ZX-HG-2', 'head-gasket')
    expect(numbers(graph, graph.partsOfKind('head-gasket'))).toEqual(['ZX-HG-1', 'ZX-HG-2', 'ZX-HG-3'])
    graph.setPart(1, 'ZX-HG-0', 'head-gasket')
    graph.setPart(3, 'ZX-BL-2', 'block')
    graph.removePart(2)
    graph.setPart(2, 'ZX-HG-5', 'head-gasket')
    expect(numbers(graph, graph.partsOfKind('head-gasket'))).toEqual(['ZX-HG-0', 'ZX-HG-5'])
    expect(numbers(graph, graph.partsOfKind('block'))).toEqual(['ZX-BL-2'])
    graph.removePart(3)
    expect(graph.partsOfKind('block')).toEqual([])
    expect(graph.ruleClasses.classOf(3)).toBe(-1)
  })

  it('keeps a kind’s order as it was when only a part’s attributes change, and re-sorts after a renumbering', () => {
    const graph = new FitGraph(noDetails)
    graph.setPart(1, 'ZX-HG-2', 'head-gasket', '{"boreMm":86}')
    graph.setPart(2, 'ZX-HG-1', 'head-gasket', '{"boreMm":86}')
    const before = graph.partsOfKind('head-gasket')
    graph.setPart(1, 'ZX-HG-2', 'head-gasket', '{"boreMm":86.5}')
    expect(graph.partsOfKind('head-gasket')).toBe(before)
    expect(graph.ruleClasses.input(graph.ruleClasses.classOf(1)).attributes).toEqual({ boreMm: 86.5 })
    graph.setPart(1, 'ZX-HG-0', 'head-gasket', '{"boreMm":86.5}')
    expect(numbers(graph, graph.partsOfKind('head-gasket'))).toEqual(['ZX-HG-0', 'ZX-HG-1'])
  })
})
