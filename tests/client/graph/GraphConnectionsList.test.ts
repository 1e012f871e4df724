import { mount } from '@vue/test-utils'
import { describe, expect, it } from 'vitest'
import type { GraphEdge, GraphNode } from '@shared/schemas/graph'
import GraphConnectionsList from '@/components/graph/GraphConnectionsList.vue'

function makeAnswer(centre: string, edgeCount: number): { nodes: GraphNode[]; edges: GraphEdge[] } {
  const node = (id: string, distance: number): GraphNode => ({
    id,
    partNumber: id,
    name: `${id} name`,
    kind: 'head',
    family: 'TK18',
    distance,
  })
  const others = Array.from({ length: edgeCount }, (_, index) => node(`${centre}-N${index}`, 1))
  return {
    nodes: [node(centre, 0), ...others],
    edges: others.map((other, index) => ({
      id: `e${index}`,
      source: centre,
      target: other.id,
      type: 'link',
      relation: 'fits',
      review: 'approved',
    })),
  }
}

function mountList(answer: ReturnType<typeof makeAnswer>) {
  return mount(GraphConnectionsList, {
    props: { ...answer, selected: null },
    global: { stubs: { RouterLink: { template: '<a><slot /></a>' } } },
  })
}

describe('GraphConnectionsList', () => {
  it('starts unfolded for a short list and folded for a long one', () => {
    expect(mountList(makeAnswer('TK18-HD-0001', 3)).get('details').attributes('open')).toBeDefined()
    expect(mountList(makeAnswer('TK18-HD-0001', 41)).get('details').attributes('open')).toBeUndefined()
  })

  it('folds or unfolds again by the size of a new answer, without being mounted afresh', async () => {
    const wrapper = mountList(makeAnswer('TK18-HD-0001', 3))
    const details = wrapper.get('details')

    await wrapper.setProps(makeAnswer('TK20V-BL-0002', 60))
    expect(details.attributes('open')).toBeUndefined()
    expect(wrapper.find('table').exists()).toBe(false)

    await wrapper.setProps(makeAnswer('TK18-HD-0003', 2))
    expect(details.attributes('open')).toBeDefined()
    expect(wrapper.findAll('tbody tr')).toHaveLength(2)
    expect(wrapper.get('details').element).toBe(details.element)
  })
})
