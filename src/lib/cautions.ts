import { DEFERENCE } from '@shared/advisory'
import type { Caution } from '@shared/schemas/build'

const RANK: Record<Caution['severity'], number> = { danger: 0, warning: 1, info: 2 }

/** Danger first, then warnings, then notes; the deference sentence is the panel's own footer, so not repeated. */
export function orderedCautions(cautions: readonly Caution[]): Caution[] {
  return cautions
    .filter((caution) => caution.text !== DEFERENCE.text)
    .map((caution, index) => ({ caution, index }))
    .sort((a, b) => RANK[a.caution.severity] - RANK[b.caution.severity] || a.index - b.index)
    .map(({ caution }) => caution)
}

export const SEVERITY_LOOKS: Record<Caution['severity'], { word: string; icon: string }> = {
  danger: { word: 'Danger', icon: 'pi-exclamation-circle' },
  warning: { word: 'Warning', icon: 'pi-exclamation-triangle' },
  info: { word: 'Note', icon: 'pi-info-circle' },
}
