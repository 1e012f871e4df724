import type { Modification } from '../../shared/schemas/fitment'

/** Stand-in for a name no catalogue entry has yet (an import may name one before an editor writes it up). */
export function unknownModification(name: string): Modification {
  return {
    name,
    title: name,
    summary: 'Not yet described by an editor.',
    steps: [],
    extraParts: [],
    consumables: [],
    skillLevel: 'skilled',
    timeMinutes: null,
    cautions: [],
    status: 'proposed',
  }
}
