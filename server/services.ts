import type { DataSource } from 'typeorm'
import type { AppConfig } from './config/env'
import type { RuleBook } from './reasoning/rule-book'
import { BuildCompletionService } from './builds/build-completion.service'
import { BuildEvaluationService } from './builds/build-evaluation.service'
import { BuildFillService } from './builds/build-fill.service'
import { BuildSheetService } from './builds/build-sheet.service'
import { ExportService } from './imports/export.service'
import { FitGraphIndex } from './fitment/fit-graph'
import { FitmentService } from './fitment/fitment.service'
import { SubstitutesService } from './fitment/substitutes.service'
import { InferredFits } from './fitment/inferred-fits'
import { GraphService } from './fitment/graph.service'
import { LinkService } from './fitment/link.service'
import { ImportService } from './imports/import.service'
import { ModificationService } from './catalogue/modification.service'
import { PartService } from './catalogue/part.service'
import { PartLookupService } from './catalogue/part-lookup.service'
import { UserService } from './users/user.service'
import { FieldReportRepository } from './field-reports/field-report.repository'
import { FieldReportService } from './field-reports/field-report.service'
import { PhotoStorage } from './field-reports/photo-storage'
import { FieldReportNotices } from './field-reports/field-report-notices'
import { Mailer } from './mail/mailer'
import { StockIndex } from './stock/stock-index'
import { PartsListShelf } from './stock/parts-list-shelf'
import { StockRepository } from './stock/stock.repository'
import { StockPhotoRepository } from './stock/stock-photo.repository'
import { StockPhotoService } from './stock/stock-photo.service'
import { StockService } from './stock/stock.service'
import { VehicleRepository } from './vehicles/vehicle.repository'
import { VehicleService } from './vehicles/vehicle.service'
import { QuoteService } from './quotes/quote.service'
import { QuoteRepository } from './quotes/quote.repository'
import { SharedLinkService } from './shared-links/shared-link.service'
import { SharedLinkRepository } from './shared-links/shared-link.repository'
import { PartRepository } from './catalogue/part.repository'
import { ShopSettingsService } from './settings/shop-settings.service'
import { OutboxRepository } from './mail/outbox.repository'
import { OutboxService } from './mail/outbox.service'
import { FieldReportEvidence } from './field-reports/field-report-evidence'
import { FieldReportReviewService } from './field-reports/field-report-review.service'
import { databaseOf } from './db/sqlite-connection'
import { SecurityEventService } from './security/security-events.service'
import { AccountService } from './auth/account.service'
import { OwnPasswordService } from './auth/own-password.service'
import { AccountTokenRepository } from './auth/account-token.repository'
import { ResetThrottle } from './auth/reset-throttle'
import { SessionRepository } from './auth/session.repository'
import { SignInThrottleRepository } from './auth/sign-in-throttle.repository'
import { createSignInThrottle } from './auth/sign-in-throttle'

/** Every service, built once per app around one data source and one rule book. */
export function createServices(dataSource: DataSource, config: AppConfig, rules: RuleBook) {
  const graphIndex = new FitGraphIndex(dataSource)
  const parts = new PartService(dataSource, () => graphIndex.snapshot())
  const modifications = new ModificationService(dataSource)
  const evidence = new FieldReportEvidence(databaseOf(dataSource))
  const stockRows = new StockRepository(databaseOf(dataSource))
  const evaluation = new BuildEvaluationService(parts, graphIndex, rules, modifications, evidence, new PartsListShelf(stockRows))
  const photos = new PhotoStorage(config.uploadDir)
  const stockIndex = new StockIndex(stockRows)
  const stock = new StockService(stockRows, parts, stockIndex)
  const users = new UserService(dataSource)
  const outboxRows = new OutboxRepository(databaseOf(dataSource))
  const outbox = new OutboxService(outboxRows, new Mailer({ smtpUrl: config.smtpUrl, mailDir: config.mailDir, from: config.mailFrom }))
  const fieldReports = new FieldReportService(new FieldReportRepository(databaseOf(dataSource)), parts, photos)
  const fieldReportNotices = new FieldReportNotices(outbox, outboxRows, users, fieldReports, config.publicUrl, databaseOf(dataSource))
  const completion = new BuildCompletionService(parts, graphIndex, evaluation, modifications, stockIndex)
  const shopSettings = new ShopSettingsService(databaseOf(dataSource))
  const imports = new ImportService(dataSource, { maxRows: config.importMaxRows }, graphIndex, stockIndex)
  const sheets = new BuildSheetService(dataSource, parts, evaluation)
  const securityEvents = new SecurityEventService(dataSource)
  const accountRows = new AccountTokenRepository(databaseOf(dataSource))
  const sessions = new SessionRepository(databaseOf(dataSource))
  const accounts = new AccountService(databaseOf(dataSource), accountRows, {
    users,
    outbox,
    sessions,
    events: securityEvents,
    resetThrottle: new ResetThrottle(new SignInThrottleRepository(databaseOf(dataSource)), config.resetLimits),
    publicUrl: config.publicUrl,
  })
  const vehicles = new VehicleService(new VehicleRepository(databaseOf(dataSource)), parts)
  const quotes = new QuoteService(
    databaseOf(dataSource),
    evaluation,
    sheets,
    shopSettings,
    stockRows,
    stockIndex,
    new PartRepository(databaseOf(dataSource)),
    new QuoteRepository(databaseOf(dataSource)),
    vehicles,
  )
  const ownPassword = new OwnPasswordService(accountRows, {
    sessions,
    events: securityEvents,
    signInThrottle: createSignInThrottle(dataSource, config.loginLimits),
  })
  return {
    rules,
    users,
    outbox,
    fieldReportNotices,
    securityEvents,
    accounts,
    ownPassword,
    parts,
    partLookup: new PartLookupService(dataSource, parts),
    graphIndex,
    modifications,
    fitment: new FitmentService(parts, graphIndex, new InferredFits(rules), modifications, evidence, stockIndex),
    graph: new GraphService(parts, graphIndex),
    substitutes: new SubstitutesService(parts, graphIndex),
    evaluation,
    completion,
    fill: new BuildFillService(graphIndex, evaluation, completion),
    sheets,
    shopSettings,
    quotes,
    sharedLinks: new SharedLinkService(databaseOf(dataSource), new SharedLinkRepository(databaseOf(dataSource)), {
      sheets,
      quotes,
      outbox,
      publicUrl: config.publicUrl,
    }),
    links: new LinkService(dataSource, parts, graphIndex),
    imports,
    exports: new ExportService(imports.jobRunner),
    photos,
    stockIndex,
    stock,
    stockPhotos: new StockPhotoService(new StockPhotoRepository(databaseOf(dataSource)), photos, stock),
    vehicles,
    fieldReports,
    fieldReportReview: new FieldReportReviewService(dataSource, fieldReports, graphIndex, fieldReportNotices),
  }
}
export type Services = ReturnType<typeof createServices>
