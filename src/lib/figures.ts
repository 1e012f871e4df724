import type { BuildFigures } from '@shared/schemas/build'
import { formatDecimal } from './format'

export type FigureRow = { key: string; label: string; value: string; unit: string; note?: string }

const format = formatDecimal

/**
 * The computed figures a technician checks, each with its unit. Figures the
 * build cannot give yet (a slot is empty) are left out rather than shown as 0.
 */
export function figureRows(figures: BuildFigures): FigureRow[] {
  const rows: FigureRow[] = []
  const add = (row: FigureRow | null) => row && rows.push(row)
  const f = figures
  add(
    f.displacementCc !== null
      ? {
          key: 'displacement',
          label: 'Displacement',
          value: format(f.displacementCc, 0),
          unit: 'cc',
          note: f.sweptVolumeCc !== null ? `${format(f.sweptVolumeCc, 1)} cc per cylinder` : undefined,
        }
      : null,
  )
  add(
    f.compressionRatio !== null
      ? {
          key: 'compression',
          label: 'Static compression ratio',
          value: format(f.compressionRatio, 2),
          unit: ': 1',
          note: f.clearanceVolumeCc !== null ? `clearance volume ${format(f.clearanceVolumeCc, 1)} cc per cylinder` : undefined,
        }
      : null,
  )
  add(
    f.injectorHeadroomPct !== null
      ? {
          key: 'injector-headroom',
          label: 'Injector headroom',
          value: format(f.injectorHeadroomPct, 1),
          unit: '%',
          note:
            f.injectorNeededCcMin !== null && f.injectorAvailableCcMin !== null
              ? `needs ${format(f.injectorNeededCcMin, 0)} cc/min, has ${format(f.injectorAvailableCcMin, 0)} cc/min per injector`
              : undefined,
        }
      : null,
  )
  add(
    f.headBoltProjectionMm !== null
      ? {
          key: 'bolt-projection',
          label: 'Head bolt projection into the block',
          value: format(f.headBoltProjectionMm, 1),
          unit: 'mm',
          note:
            [
              f.threadEngagementMinMm !== null ? `at least ${format(f.threadEngagementMinMm, 1)} mm` : '',
              f.headBoltMaxProjectionMm !== null ? `at most ${format(f.headBoltMaxProjectionMm, 1)} mm` : '',
            ]
              .filter(Boolean)
              .join(', ') || undefined,
        }
      : null,
  )
  add(
    f.headBoltLengthRangeMm
      ? {
          key: 'bolt-length',
          label: 'Head bolt lengths that suit',
          value: `${format(f.headBoltLengthRangeMm.min, 0)}–${format(f.headBoltLengthRangeMm.max, 0)}`,
          unit: 'mm',
        }
      : null,
  )
  add(f.washerStackMm !== null ? { key: 'washers', label: 'Hardened washer stack', value: format(f.washerStackMm, 1), unit: 'mm' } : null)
  add(
    f.camCrankCentreMm !== null
      ? { key: 'centres', label: 'Cam to crank centres', value: format(f.camCrankCentreMm, 1), unit: 'mm' }
      : null,
  )
  add(
    f.beltTeethNeeded !== null
      ? {
          key: 'belt-teeth',
          label: 'Timing belt length needed',
          value: format(f.beltTeethNeeded, 1),
          unit: 'teeth',
          note: f.beltCentreShiftMm !== null ? `the chosen belt runs ${format(f.beltCentreShiftMm, 2)} mm off these centres` : undefined,
        }
      : null,
  )
  return rows
}
