import type { PartKind } from '../../shared/schemas/part-kinds'
import type { Random } from './random'

/*
 * Invented engine families (codes in the demo maker's TK style). Each family
 * draws its interface codes from small pools, so many families share a bolt
 * pattern, a port pattern or a connector: attribute values repeat the way
 * they do in a real catalogue, and the rules find many candidates per value.
 */
export type Family = {
  code: string
  cylinders: number
  boreMm: number
  strokeMm: number
  headBoltPattern: string
  thread: string
  intakePort: string
  exhaustPort: string
  camNose: string
  crankSnout: string
  distributorMount: string
  capStyle: string
  internals: string
  connector: string
  fuelRailMount: string
  injectorPlug: string
  diagnostic: 'pre-obd' | 'obd-i' | 'obd-ii'
  variableLift: boolean
  lowImpedance: boolean
  restrictorInBlock: boolean
  crankToDeckMm: number
  pitchMm: number
  profile: 'trapezoidal' | 'curvilinear' | 'modified-curvilinear'
  beltTeeth: number
  yearFrom: number
}

const pool = (prefix: string, size: number) => Array.from({ length: size }, (_, i) => `${prefix}${i + 1}`)
const letters = ['A', 'B', 'C', 'D']
const POOLS = {
  boltPattern: Array.from({ length: 40 }, (_, i) => `P${10 + Math.floor(i / 4)}-${letters[i % 4]}`),
  thread: ['M10x1.25', 'M10x1.5', 'M11x1.5', 'M12x1.5', 'M12x1.75'],
  intakePort: pool('IP-', 90),
  exhaustPort: pool('EP-', 90),
  camNose: pool('CN-', 12),
  crankSnout: pool('CS-', 15),
  distributorMount: pool('DM-', 9),
  capStyle: pool('CAP-', 10),
  internals: pool('IG-', 14),
  connector: pool('K-', 30),
  fuelRailMount: pool('FR-', 20),
  injectorPlug: pool('PL-', 8),
}
const BORES = [78, 79.5, 81, 82.5, 84, 85, 86, 87.5, 89, 91, 92.5]
const STROKES = [75, 78, 81, 83, 86, 88, 90.5, 94]

export function inventFamilies(count: number, random: Random): Family[] {
  return Array.from({ length: count }, (_, i) => ({
    code: `TK${100 + i}${random.pick(['', '', 'V', 'E', 'T'])}`,
    cylinders: random.pick([4, 4, 4, 3, 5, 6, 6, 8]),
    boreMm: random.pick(BORES),
    strokeMm: random.pick(STROKES),
    headBoltPattern: random.pick(POOLS.boltPattern),
    thread: random.pick(POOLS.thread),
    intakePort: random.pick(POOLS.intakePort),
    exhaustPort: random.pick(POOLS.exhaustPort),
    camNose: random.pick(POOLS.camNose),
    crankSnout: random.pick(POOLS.crankSnout),
    distributorMount: random.pick(POOLS.distributorMount),
    capStyle: random.pick(POOLS.capStyle),
    internals: random.pick(POOLS.internals),
    connector: random.pick(POOLS.connector),
    fuelRailMount: random.pick(POOLS.fuelRailMount),
    injectorPlug: random.pick(POOLS.injectorPlug),
    diagnostic: random.pick(['pre-obd', 'obd-i', 'obd-i', 'obd-ii'] as const),
    variableLift: random.next() < 0.3,
    lowImpedance: random.next() < 0.25,
    restrictorInBlock: random.next() < 0.5,
    crankToDeckMm: random.pick([198, 205, 207.5, 211, 214.8, 220]),
    pitchMm: random.pick([8, 9.525]),
    profile: random.pick(['trapezoidal', 'curvilinear', 'modified-curvilinear'] as const),
    beltTeeth: random.pick([96, 101, 104, 106, 110, 113, 121]),
    yearFrom: 1978 + random.int(30),
  }))
}

/** The CSV cell of one attribute of a part derived from a family; '' leaves it unknown. */
export function attributeCell(name: string, kind: PartKind, family: Family, random: Random): string {
  const f = family
  const flag = (value: boolean) => (value ? 'true' : 'false')
  switch (name) {
    case 'cylinders':
      return String(f.cylinders)
    case 'boreMm':
      return String(kind === 'head-gasket' ? f.boreMm + random.pick([0.5, 1, 1.5]) : f.boreMm)
    case 'strokeMm':
      return String(f.strokeMm)
    case 'deckClearanceMm':
      return String(random.pick([0.2, 0.25, 0.3, 0.35, 0.5]))
    case 'pistonVolumeCc':
      return String(random.pick([-4, 0, 4, 6, 8]))
    case 'headBoltPattern':
      return f.headBoltPattern
    case 'headBoltThread':
    case 'thread':
      return f.thread
    case 'headBoltCount':
    case 'setQuantity':
      return String(f.cylinders * 2 + 2)
    case 'tappedDepthMm':
      return String(random.pick([32, 35, 38, 40]))
    case 'material':
      return kind === 'head' || random.next() < 0.3 ? 'aluminium' : 'cast-iron'
    case 'oilRestrictor':
      return flag(kind === 'block' ? f.restrictorInBlock : !f.restrictorInBlock)
    case 'crankToDeckMm':
      return String(f.crankToDeckMm)
    case 'tensionerRangeMm':
      return String(random.pick([1.5, 2, 2.5, 3]))
    case 'crankSnout':
      return f.crankSnout
    case 'chamberCc':
      return String(38 + random.int(19))
    case 'boltBossHeightMm':
      return String(80 + random.int(16))
    case 'distributorMount':
    case 'mountPattern':
      return f.distributorMount
    case 'valveLift':
      return f.variableLift ? 'variable' : 'fixed'
    case 'intakePortPattern':
      return f.intakePort
    case 'exhaustPortPattern':
      return f.exhaustPort
    case 'portPattern':
      return kind.startsWith('intake') ? f.intakePort : f.exhaustPort
    case 'camNose':
      return f.camNose
    case 'camAboveDeckMm':
      return String(52 + random.int(11))
    case 'compressedThicknessMm':
      return String(random.pick([0.7, 1.0, 1.2, 1.4]))
    case 'construction':
      return random.pick(['multi-layer-steel', 'composite', 'copper'])
    case 'lengthMm':
      return String(100 + random.int(41))
    case 'torqueToYield':
      return flag(random.next() < 0.7)
    case 'washerThicknessMm':
      return String(random.pick([0, 2, 3]))
    case 'capStyle':
      return f.capStyle
    case 'internals':
      return f.internals
    case 'internalsTransferable':
      return flag(random.next() < 0.6)
    case 'diagnosticGeneration':
      return f.diagnostic
    case 'variableValveLift':
    case 'vvlLeads':
      return flag(f.variableLift)
    case 'vvlLampWhenAbsent':
      return f.variableLift ? random.pick(['on', 'off']) : ''
    case 'connector':
      return f.connector
    case 'injectorImpedance':
    case 'impedance':
      return f.lowImpedance ? 'low' : 'high'
    case 'injectorPlug':
    case 'plug':
      return f.injectorPlug
    case 'fuelRailMount':
      return f.fuelRailMount
    case 'injectorCupMm':
    case 'sealMm':
      return String(random.pick([11, 14]))
    case 'outlets':
      return String(f.cylinders)
    case 'pressureBar':
    case 'ratedPressureBar':
      return String(random.pick([2.5, 3, 3.5, 4]))
    case 'flowCcMin':
      return String(180 + 10 * random.int(38))
    case 'teeth':
      return String(kind === 'timing-belt' ? f.beltTeeth : kind === 'cam-gear' ? 42 + random.int(3) : 21 + random.int(2))
    case 'pitchMm':
      return String(f.pitchMm)
    case 'profile':
      return f.profile
    case 'widthMm':
      return String(random.pick([19, 22, 25]))
    case 'orificeMm':
      return String(random.pick([1.4, 1.6, 1.8, 2.0]))
    case 'thicknessMm':
      return String(random.pick([1, 2, 3]))
    case 'innerDiameterMm':
      return String(8 + random.int(33))
    case 'quantityPerPack':
      return String(random.pick([1, 2, 5, 10]))
    default:
      return ''
  }
}
