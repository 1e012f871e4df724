import { DEFERENCE } from '@shared/advisory'
import type { Caution } from '@shared/schemas/build'
import type { ModificationCaution } from '@shared/schemas/fitment'

/**
 * The cautions a panel lists, in the server's order (danger, warning, then notes).
 * The deference sentence is the panel's own footer, so it is not listed again.
 */
export function listedCautions(cautions: readonly Caution[]): Caution[] {
  return cautions.filter((caution) => caution.text !== DEFERENCE.text)
}

export const SEVERITY_LOOKS: Record<Caution['severity'], { word: string; icon: string }> = {
  danger: { word: 'Danger', icon: 'pi-exclamation-circle' },
  warning: { word: 'Warning', icon: 'pi-exclamation-triangle' },
  info: { word: 'Note', icon: 'pi-info-circle' },
}

/** A modification's cautions as text with the service manual section that governs, where one is named. */
export function modificationCautions(cautions: readonly ModificationCaution[]): { text: string; manual?: string }[] {
  return cautions.map((caution) => (typeof caution === 'string' ? { text: caution } : caution))
}
