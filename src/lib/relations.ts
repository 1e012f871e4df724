import type { Verdict } from '@shared/schemas/fitment'

/** How two parts relate, as drawn and labelled everywhere in the client. */
export type FitLook = Verdict | 'identical'

export type FitLookStyle = {
  /** Full wording, used in badges, headings and the legend. */
  label: string
  /** Short wording for graph edges. */
  short: string
  /** PrimeIcons class for badges. */
  icon: string
  /** Text glyph drawn with the edge label (canvas text, so no icon font). */
  glyph: string
  /** Line style in the graph: relation is never told by colour alone. */
  line: 'solid' | 'dashed' | 'dotted' | 'double'
  /** The shape drawn at both ends of a graph edge. */
  marker: 'diamond' | 'tee' | 'none' | 'square'
  /** CSS custom property with the (extra) colour. */
  colourVar: string
}

export const FIT_LOOKS: Record<FitLook, FitLookStyle> = {
  fits: { label: 'Fits', short: 'fits', icon: 'pi-check-circle', glyph: '✓', line: 'solid', marker: 'none', colourVar: '--fw-fits' },
  'fits-with-modification': {
    label: 'Fits with modification',
    short: 'with mod.',
    icon: 'pi-wrench',
    glyph: '◆',
    line: 'dashed',
    marker: 'diamond',
    colourVar: '--fw-modified',
  },
  'does-not-fit': {
    label: 'Does not fit',
    short: 'no fit',
    icon: 'pi-ban',
    glyph: '✕',
    line: 'dotted',
    marker: 'tee',
    colourVar: '--fw-no-fit',
  },
  unknown: {
    label: 'No evidence either way',
    short: 'unknown',
    icon: 'pi-question-circle',
    glyph: '?',
    line: 'dotted',
    marker: 'square',
    colourVar: '--fw-unknown',
  },
  identical: {
    label: 'Same part, another number',
    short: 'same part',
    icon: 'pi-equals',
    glyph: '≡',
    line: 'double',
    marker: 'none',
    colourVar: '--fw-unknown',
  },
}

export const REVIEW_LABELS = {
  approved: 'Reviewed link',
  proposed: 'Proposed, awaiting review',
  inferred: 'Inferred by the rules',
  rejected: 'Rejected',
} as const
