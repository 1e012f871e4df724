/** Engine displacement, Heywood sec. 2.2: V = n·π/4·B²·S. Bore and stroke in mm, result in cc. */
import { requirePositiveInteger } from './guards'
import { sweptVolumeCc } from './compression'

export function displacementCc(cylinders: number, boreMm: number, strokeMm: number): number {
  requirePositiveInteger(cylinders, 'cylinders')
  return cylinders * sweptVolumeCc(boreMm, strokeMm)
}
