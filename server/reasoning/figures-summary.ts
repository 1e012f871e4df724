import type { BuildContext, BuildFigures } from '../../shared/schemas/build'
import type { FigureFacts } from './figures'

/** The API's summary of the figures, every one with its unit in its name. */
export function summariseFigures(figures: FigureFacts, context: BuildContext): BuildFigures {
  return {
    displacementCc: figures.displacementCc ?? null,
    compressionRatio: figures.compressionRatio ?? null,
    sweptVolumeCc: figures.sweptVolumeCc ?? null,
    clearanceVolumeCc: figures.clearanceVolumeCc ?? null,
    injectorHeadroomPct: figures.injector?.headroomPct ?? null,
    injectorNeededCcMin: figures.injector?.neededCcMin ?? null,
    injectorAvailableCcMin: figures.injector?.availableCcMin ?? null,
    headBoltProjectionMm: figures.headBolt?.projectionMm ?? null,
    threadEngagementMinMm: figures.headBolt?.minEngagementMm ?? null,
    headBoltMaxProjectionMm: figures.headBolt?.maxProjectionMm ?? null,
    headBoltLengthRangeMm: figures.headBolt?.lengthRangeMm ?? null,
    washerStackMm: figures.headBolt?.status === 'bottoms' ? (figures.headBolt.washerStackMm ?? null) : null,
    camCrankCentreMm: figures.timing?.centreMm ?? null,
    beltCentreShiftMm: figures.timing?.centreShiftMm ?? null,
    beltTeethNeeded: figures.timing?.beltTeethNeeded ?? null,
    quenchMm: figures.quench?.mm ?? null,
    chassisModelYear: context.chassisModelYear ?? null,
  }
}
