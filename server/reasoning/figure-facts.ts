import { displacementCc } from '../../shared/engineering/displacement'
import type { BuildContext } from '../../shared/schemas/build'
import { deckFinishFigures } from './figures-deck'
import { headBoltPositionFigures } from './figures-head-bolts'
import type { Companions } from './figures-ignition'
import { ignitionFigures } from './figures-ignition'
import { compression, headBolt, injector, injectorCalibration, quench, timing, type FigureFacts, type SlotParts } from './figures'
import { bool, num, text } from './part-values'

const round = (value: number, places: number) => Math.round(value * 10 ** places) / 10 ** places
const UNSET = Symbol('unset')

/**
 * Every figure the chosen parts allow; a figure that lacks an input reads as
 * undefined. Every figure is worked out when read, the costly ones
 * (compression, bolts, timing, injectors, ignition, faces) once and kept,
 * because judging one pair reads only a few of them and completion judges
 * thousands of candidates. Read the figures by name: they are getters, not
 * own properties.
 */
class BuildFigureFacts implements FigureFacts {
  #compression: ReturnType<typeof compression> | undefined
  #headBolt: FigureFacts['headBolt'] | typeof UNSET = UNSET
  #headBoltPositions: FigureFacts['headBoltPositions'] | typeof UNSET = UNSET
  #timing: FigureFacts['timing'] | typeof UNSET = UNSET
  #injector: FigureFacts['injector'] | typeof UNSET = UNSET
  #quench: FigureFacts['quench'] | typeof UNSET = UNSET
  #injectorCalibration: FigureFacts['injectorCalibration'] | typeof UNSET = UNSET
  #ignition: FigureFacts['ignition'] | typeof UNSET = UNSET
  #deckFinish: FigureFacts['deckFinish'] | typeof UNSET = UNSET
  #companions: Companions | (() => Companions)

  constructor(
    private readonly parts: SlotParts,
    private readonly context: BuildContext,
    companions: Companions | (() => Companions),
  ) {
    this.#companions = companions
  }

  // The sums: cheap enough to work out on every read.
  get displacementCc() {
    const { block } = this.parts
    const bore = num(block, 'boreMm')
    const stroke = num(block, 'strokeMm')
    const count = num(block, 'cylinders')
    return bore && stroke && count ? round(displacementCc(count, bore, stroke), 1) : undefined
  }
  get gasketBoreExcessMm() {
    const bore = num(this.parts.block, 'boreMm')
    const gasketBore = num(this.parts['head-gasket'], 'boreMm')
    return bore && gasketBore ? round(gasketBore - bore, 2) : undefined
  }
  get oilRestrictors() {
    const headRestrictor = bool(this.parts.head, 'oilRestrictor')
    const blockRestrictor = bool(this.parts.block, 'oilRestrictor')
    if (headRestrictor === undefined || blockRestrictor === undefined) return undefined
    return Number(headRestrictor) + Number(blockRestrictor) + (this.parts['oil-restrictor'] ? 1 : 0)
  }
  get vvlMatch() {
    const ecuVvl = bool(this.parts.ecu, 'variableValveLift')
    const headLift = text(this.parts.head, 'valveLift')
    return ecuVvl !== undefined && headLift ? ecuVvl === (headLift === 'variable') : undefined
  }
  get engineModelYear() {
    return this.parts.block?.yearTo || undefined
  }
  get fuelSystemOpened() {
    return Boolean(this.parts['fuel-rail'] || this.parts.injector || this.parts['intake-manifold'])
  }
  get electricsTouched() {
    return Boolean(this.parts.ecu || this.parts.harness)
  }

  private companions(): Companions {
    if (typeof this.#companions === 'function') this.#companions = this.#companions()
    return this.#companions
  }

  private get compressed() {
    return (this.#compression ??= compression(this.parts))
  }
  get compressionRatio() {
    return this.compressed.compressionRatio
  }
  get sweptVolumeCc() {
    return this.compressed.sweptVolumeCc
  }
  get clearanceVolumeCc() {
    return this.compressed.clearanceVolumeCc
  }
  get headBolt() {
    if (this.#headBolt === UNSET) this.#headBolt = headBolt(this.parts)
    return this.#headBolt
  }
  get headBoltPositions() {
    if (this.#headBoltPositions === UNSET) this.#headBoltPositions = headBoltPositionFigures(this.parts, this.companions())
    return this.#headBoltPositions
  }
  get timing() {
    if (this.#timing === UNSET) this.#timing = timing(this.parts)
    return this.#timing
  }
  get injector() {
    if (this.#injector === UNSET) this.#injector = injector(this.parts, this.context)
    return this.#injector
  }
  get quench() {
    if (this.#quench === UNSET) this.#quench = quench(this.parts)
    return this.#quench
  }
  get injectorCalibration() {
    if (this.#injectorCalibration === UNSET) this.#injectorCalibration = injectorCalibration(this.parts)
    return this.#injectorCalibration
  }
  get ignition() {
    if (this.#ignition === UNSET) this.#ignition = ignitionFigures(this.parts, this.companions())
    return this.#ignition
  }
  get deckFinish() {
    if (this.#deckFinish === UNSET) this.#deckFinish = deckFinishFigures(this.parts, this.context)
    return this.#deckFinish
  }
}

/** The figures of a build (see BuildFigureFacts); `companions` may be given as a function, called only if a figure needs them. */
export function computeFigures(
  parts: SlotParts,
  context: BuildContext = {},
  companions: Companions | (() => Companions) = {},
): FigureFacts {
  return new BuildFigureFacts(parts, context, companions)
}
