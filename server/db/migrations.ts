import { CsvImport1796154117731 } from '../migrations/1796154117731-CsvImport'
import { FitmentGraph1796151639561 } from '../migrations/1796151639561-FitmentGraph'
import { Foundation1796150879975 } from '../migrations/1796150879975-Foundation'
import { PartWords1796197875848 } from '../migrations/1796197875848-PartWords'

/** In the order they run. */
export const migrations = [Foundation1796150879975, FitmentGraph1796151639561, CsvImport1796154117731, PartWords1796197875848]
