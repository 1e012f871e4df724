import { AppSettingEntity } from '../settings/app-setting.entity'
import { BuildSheetEntity } from '../builds/build-sheet.entity'
import { IdentityEntity } from '../fitment/identity.entity'
import { ImportBatchEntity } from '../audit/import-batch.entity'
import { ImportChangeEntity } from '../audit/import-change.entity'
import { LinkEntity } from '../fitment/link.entity'
import { ModificationEntity } from '../catalogue/modification.entity'
import { PartMarkEntity } from '../catalogue/part-mark.entity'
import { PartEntity } from '../catalogue/part.entity'
import { PartWordEntity } from '../catalogue/part-word.entity'
import { SessionEntity } from '../auth/session.entity'
import { SecurityEventEntity } from '../security/security-event.entity'
import { SignInThrottleEntity } from '../auth/sign-in-throttle.entity'
import { UserEntity } from '../users/user.entity'

export const entities = [
  UserEntity,
  SessionEntity,
  SignInThrottleEntity,
  SecurityEventEntity,
  AppSettingEntity,
  PartEntity,
  PartMarkEntity,
  PartWordEntity,
  ModificationEntity,
  LinkEntity,
  IdentityEntity,
  BuildSheetEntity,
  ImportBatchEntity,
  ImportChangeEntity,
]
