import type { DataSource, Repository } from 'typeorm'
import { isSlotId } from '../../shared/build-template'
import {
  faceFinishOf,
  sheetContext,
  type BuildSheet,
  type BuildSheetInput,
  type BuildSheetUpdate,
  type Evaluation,
} from '../../shared/schemas/build'
import type { User } from '../../shared/schemas/auth'
import { can } from '../../shared/permissions'
import { BuildSheetEntity } from './build-sheet.entity'
import { BuildSheetRepository, type BuildSheetRow } from './build-sheet.repository'
import { databaseOf } from '../db/sqlite-connection'
import { AppError } from '../errors/app-error'
import { resolveSlots } from './build-slots'
import type { PartService } from '../catalogue/part.service'
import type { BuildEvaluationService } from './build-evaluation.service'
import { verdictSchema } from '../../shared/schemas/fitment'

function toBuildSheet(entity: BuildSheetEntity): BuildSheet {
  return {
    id: entity.id,
    name: entity.name,
    slots: entity.slots,
    targetPowerKw: entity.targetPowerKw,
    fuelOctane: entity.fuelOctane,
    chassisModelYear: entity.chassisModelYear,
    vin: entity.vin,
    vehicleId: entity.vehicleId ?? null,
    faceFinish: entity.faceFinish ?? null,
    notes: entity.notes,
    checklist: entity.checklist ?? {},
    verdict: verdictSchema.safeParse(entity.savedVerdict).data ?? null,
    labourMinutes: entity.labourMinutes,
    owner: { id: entity.owner.id, name: entity.owner.name },
    createdAt: entity.createdAt.toISOString(),
    updatedAt: entity.updatedAt.toISOString(),
  }
}

function rowOf(entity: BuildSheetEntity): BuildSheetRow {
  const { name, slots, targetPowerKw, fuelOctane, chassisModelYear, vin, vehicleId, faceFinish, notes, checklist } = entity
  return {
    name,
    slots,
    targetPowerKw,
    fuelOctane,
    chassisModelYear,
    vin,
    vehicleId,
    faceFinish: faceFinish ?? null,
    notes,
    checklist: checklist ?? {},
    savedVerdict: entity.savedVerdict ?? null,
    labourMinutes: entity.labourMinutes ?? null,
  }
}

/** A step ticked twice is ticked once; an untouched modification is not stored. */
function sortedTicks(ticks: Record<string, number[]>): Record<string, number[]> {
  return Object.fromEntries(
    Object.entries(ticks)
      .map(([name, steps]) => [name, [...new Set(steps)].sort((a, b) => a - b)] as const)
      .filter(([, steps]) => steps.length > 0),
  )
}

/** Build sheets belong to their author; editors and administrators see and manage all of them. */
export class BuildSheetService {
  private readonly sheets: Repository<BuildSheetEntity>

  private readonly rows: BuildSheetRepository

  constructor(
    dataSource: DataSource,
    private readonly parts: PartService,
    private readonly evaluation: BuildEvaluationService,
  ) {
    this.sheets = dataSource.getRepository(BuildSheetEntity)
    this.rows = new BuildSheetRepository(databaseOf(dataSource))
  }

  async list(user: User): Promise<BuildSheet[]> {
    const where = can(user.role, 'builds.see-all') ? {} : { ownerId: user.id }
    const all = await this.sheets.find({ where, relations: { owner: true }, order: { updatedAt: 'DESC', id: 'DESC' } })
    return all.map(toBuildSheet)
  }

  private async owned(id: number, user: User): Promise<BuildSheetEntity> {
    const entity = await this.sheets.findOne({ where: { id }, relations: { owner: true } })
    // Someone else's sheet answers like a missing one, so ids cannot be probed.
    if (!entity || (entity.ownerId !== user.id && !can(user.role, 'builds.see-all'))) {
      throw AppError.notFound(`No build sheet ${id}.`)
    }
    return entity
  }

  async get(id: number, user: User): Promise<BuildSheet> {
    return toBuildSheet(await this.owned(id, user))
  }

  /** Slots are checked like an evaluation's (known slot, known part, right kind) and stored by part number. */
  private async checkedSlots(slots: Record<string, string>): Promise<Record<string, string>> {
    const resolved = await resolveSlots(this.parts, slots)
    return Object.fromEntries(
      Object.keys(slots)
        .filter(isSlotId)
        .flatMap((slot) => {
          const entity = resolved.get(slot)
          return entity ? [[slot, entity.partNumber]] : []
        }),
    )
  }

  async create(input: BuildSheetInput, user: User): Promise<BuildSheet> {
    const entity = this.sheets.create({
      ownerId: user.id,
      name: input.name,
      slots: await this.checkedSlots(input.slots),
      targetPowerKw: input.targetPowerKw ?? null,
      fuelOctane: input.fuelOctane ?? null,
      chassisModelYear: input.chassisModelYear ?? null,
      vin: input.vin ?? null,
      vehicleId: input.vehicleId ?? null,
      faceFinish: faceFinishOf(input),
      notes: input.notes,
      checklist: sortedTicks(input.checklist),
    })
    await this.judge(entity)
    const id = await this.rows.insert(user.id, rowOf(entity))
    return this.get(id, user)
  }

  async update(id: number, change: BuildSheetUpdate, user: User): Promise<BuildSheet> {
    const entity = await this.owned(id, user)
    if (change.name !== undefined) entity.name = change.name
    if (change.slots !== undefined) entity.slots = await this.checkedSlots(change.slots)
    if ('targetPowerKw' in change) entity.targetPowerKw = change.targetPowerKw ?? null
    if ('fuelOctane' in change) entity.fuelOctane = change.fuelOctane ?? null
    if ('chassisModelYear' in change) entity.chassisModelYear = change.chassisModelYear ?? null
    if ('vin' in change) entity.vin = change.vin ?? null
    if ('vehicleId' in change) entity.vehicleId = change.vehicleId ?? null
    if ('faceFinish' in change) entity.faceFinish = change.faceFinish ? faceFinishOf(change.faceFinish) : null
    if (change.notes !== undefined) entity.notes = change.notes
    if (change.checklist !== undefined) entity.checklist = sortedTicks(change.checklist)
    await this.judge(entity)
    await this.rows.update(id, rowOf(entity))
    return this.get(id, user)
  }

  /**
   * Judges the sheet once, when it is saved, so the list answers verdict and labour
   * without evaluating every sheet on every request. A later catalogue change shows on opening the sheet.
   */
  private async judge(entity: BuildSheetEntity) {
    // A build the planner cannot judge is still saved; the list shows no verdict for it.
    const evaluation = await this.evaluateSheet(entity)
    if (!evaluation) {
      entity.savedVerdict = null
      entity.labourMinutes = null
      return
    }
    entity.savedVerdict = evaluation.verdict
    entity.labourMinutes = evaluation.modifications.reduce((sum, modification) => sum + (modification.timeMinutes ?? 0), 0)
  }

  /** Judges the sheet as it stands; null when it cannot be judged (a part left the catalogue). */
  private evaluateSheet(entity: BuildSheetEntity): Promise<Evaluation | null> {
    return this.evaluation.evaluate({ slots: entity.slots, ...sheetContext(entity) }).catch((error: unknown) => {
      if (error instanceof AppError) return null
      throw error
    })
  }

  /** A sheet opened through a shared link: no owner check (the link is the permission), judged afresh. */
  async forSharedLink(id: number): Promise<{ sheet: BuildSheet; evaluation: Evaluation | null } | null> {
    const entity = await this.sheets.findOne({ where: { id }, relations: { owner: true } })
    if (!entity) return null
    return { sheet: toBuildSheet(entity), evaluation: await this.evaluateSheet(entity) }
  }

  async remove(id: number, user: User): Promise<void> {
    await this.owned(id, user)
    await this.rows.remove(id)
  }
}
