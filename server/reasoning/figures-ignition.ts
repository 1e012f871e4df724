import type { PartAttributes } from '../../shared/schemas/part-attributes'
import { checkDriveDog, type DriveDogStatus } from '../../shared/engineering/drive-dog'
import type { SlotParts } from './figures'

/**
 * Catalogue parts a build implies without a slot of their own: the housing a
 * distributor's internals move into, and the adapter plate a sealed one sits on.
 */
export type CompanionPart = { partNumber: string; attributes: PartAttributes }
export type Companions = {
  /** Housings whose flange matches the head's mount; their cap is the one the leads go on. */
  distributorHousings?: CompanionPart[]
  /** Adapter plates from the distributor's flange to the head's mount, thinnest first. */
  distributorAdapters?: CompanionPart[]
  /** Hardened washers and spacers for the head bolts' thread, thinnest first. */
  headBoltWashers?: CompanionPart[]
}

export type IgnitionFigures = {
  /** The distributor's flange differs from the head's mount and its internals move into another housing. */
  internalsTransfer?: boolean
  /** The cap on the housing actually fitted, when the catalogue's housings for that mount agree on one. */
  housingCapStyle?: string
  housingPartNumber?: string
  adapterPlate?: { partNumber: string; thicknessMm: number }
  driveDog?: { status: DriveDogStatus; engagementMm: number; minEngagementMm: number; withLongerDogMm?: number; depthMm: number }
}

const text = (attributes: PartAttributes | undefined, name: string) => {
  const value = attributes?.[name]
  return typeof value === 'string' && value !== '' ? value : undefined
}
const num = (attributes: PartAttributes | undefined, name: string) => {
  const value = attributes?.[name]
  return typeof value === 'number' && Number.isFinite(value) ? value : undefined
}
const round = (value: number) => Math.round(value * 100) / 100

/** What the ignition rules read beyond each part's own attributes; undefined without a distributor on a head. */
export function ignitionFigures(parts: SlotParts, companions: Companions = {}): IgnitionFigures | undefined {
  const distributor = parts.distributor?.attributes
  const mount = text(parts.head?.attributes, 'distributorMount')
  const flange = text(distributor, 'mountPattern')
  if (!distributor || !mount || !flange) return undefined
  if (flange === mount) return { internalsTransfer: false }
  if (distributor.internalsTransferable === true) {
    const housings = companions.distributorHousings ?? []
    const caps = new Set(housings.map((housing) => text(housing.attributes, 'capStyle')))
    const [cap] = caps
    return {
      internalsTransfer: true,
      ...(caps.size === 1 && cap ? { housingCapStyle: cap, housingPartNumber: housings[0]!.partNumber } : {}),
    }
  }
  const plate = (companions.distributorAdapters ?? []).find((part) => num(part.attributes, 'thicknessMm') !== undefined)
  if (!plate) return { internalsTransfer: false }
  const thicknessMm = num(plate.attributes, 'thicknessMm')!
  const depthMm = num(distributor, 'driveDogDepthMm')
  const figures: IgnitionFigures = { internalsTransfer: false, adapterPlate: { partNumber: plate.partNumber, thicknessMm } }
  if (depthMm === undefined) return figures
  const check = checkDriveDog({ dogDepthMm: depthMm, plateThicknessMm: thicknessMm, longerDogMm: num(distributor, 'longerDogMm') })
  figures.driveDog = {
    status: check.status,
    engagementMm: round(check.engagementMm),
    minEngagementMm: round(check.minEngagementMm),
    depthMm,
    ...(check.withLongerDogMm === undefined ? {} : { withLongerDogMm: round(check.withLongerDogMm) }),
  }
  return figures
}
