import { AppSettingEntity } from '../entities/app-setting.entity'
import { BuildSheetEntity } from '../entities/build-sheet.entity'
import { IdentityEntity } from '../entities/identity.entity'
import { ImportBatchEntity } from '../entities/import-batch.entity'
import { ImportChangeEntity } from '../entities/import-change.entity'
import { LinkEntity } from '../entities/link.entity'
import { ModificationEntity } from '../entities/modification.entity'
import { PartMarkEntity } from '../entities/part-mark.entity'
import { PartEntity } from '../entities/part.entity'
import { SessionEntity } from '../entities/session.entity'
import { UserEntity } from '../entities/user.entity'

export const entities = [
  UserEntity,
  SessionEntity,
  AppSettingEntity,
  PartEntity,
  PartMarkEntity,
  ModificationEntity,
  LinkEntity,
  IdentityEntity,
  BuildSheetEntity,
  ImportBatchEntity,
  ImportChangeEntity,
]
