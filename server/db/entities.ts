import { SharedLinkEntity } from '../shared-links/shared-link.entity'
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
import { AccountTokenEntity } from '../auth/account-token.entity'
import { SecurityEventEntity } from '../security/security-event.entity'
import { SignInThrottleEntity } from '../auth/sign-in-throttle.entity'
import { UserEntity } from '../users/user.entity'
import { FieldReportEntity } from '../field-reports/field-report.entity'
import { FieldReportPhotoEntity } from '../field-reports/field-report-photo.entity'
import { FieldReportLinkEntity } from '../field-reports/field-report-link.entity'
import { MailOutboxEntity } from '../mail/mail-outbox.entity'
import { SiteEntity } from '../stock/site.entity'
import { StockItemEntity } from '../stock/stock-item.entity'
import { StockPhotoEntity } from '../stock/stock-photo.entity'
import { VehicleApplicationEntity } from '../vehicles/vehicle-application.entity'
import { VehicleOriginalEntity } from '../vehicles/vehicle-original.entity'
import { QuoteEntity } from '../quotes/quote.entity'
import { QuoteUnitEntity } from '../quotes/quote-unit.entity'

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
  FieldReportEntity,
  FieldReportPhotoEntity,
  FieldReportLinkEntity,
  MailOutboxEntity,
  SiteEntity,
  StockItemEntity,
  StockPhotoEntity,
  VehicleApplicationEntity,
  VehicleOriginalEntity,
  QuoteEntity,
  QuoteUnitEntity,
  AccountTokenEntity,
  SharedLinkEntity,
]
