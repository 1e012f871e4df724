import { existsSync } from 'node:fs'
import path from 'node:path'
import express, { type Express } from 'express'
import type { DataSource } from 'typeorm'
import { createPassport } from './auth/passport'
import { requireSignIn } from './auth/require-role'
import { createSessionMiddleware } from './auth/session'
import { csrfProtection } from './auth/csrf'
import { createSignInThrottle } from './auth/sign-in-throttle'
import type { AppConfig } from './config/env'
import { securityHeaders } from './middleware/security-headers'
import { errorHandler, notFoundApi } from './errors/error-handler'
import { authRoutes } from './auth/auth.routes'
import { accountRoutes } from './auth/account.routes'
import { healthRoutes } from './health/health.routes'
import { partRoutes } from './catalogue/parts.routes'
import { userRoutes } from './users/users.routes'
import { securityEventRoutes } from './security/security-events.routes'
import { buildRoutes } from './builds/builds.routes'
import { fitmentRoutes } from './fitment/fitment.routes'
import { substituteRoutes } from './fitment/substitutes.routes'
import { linkRoutes } from './fitment/links.routes'
import { importRoutes } from './imports/imports.routes'
import { fieldReportRoutes } from './field-reports/field-reports.routes'
import { mailRoutes } from './mail/mail.routes'
import { stockRoutes } from './stock/stock.routes'
import { vehicleRoutes } from './vehicles/vehicles.routes'
import { quoteRoutes } from './quotes/quotes.routes'
import { sharedLinkRoutes } from './shared-links/shared-links.routes'
import type { Services } from './services'

/** The largest JSON body any route takes. */
export const JSON_BODY_LIMIT = '64kb'

/** Addresses that name a file of the built client rather than a page. */
const STATIC_FILE = /\.(js|mjs|css|map|ico|png|jpe?g|gif|svg|webp|woff2?|ttf|json|txt|xml|html?)$/i

export type AppOptions = {
  config: AppConfig
  dataSource: DataSource
  services: Services
  version: string
  /** Folder of the built client; served with a history fallback when it exists. */
  clientDir?: string
}

/** Builds the Express app without listening, so tests can drive it with supertest. */
export async function createApp({ config, dataSource, services, version, clientDir }: AppOptions): Promise<Express> {
  const auth = createPassport(services.users)
  const app = express()
  app.disable('x-powered-by')
  app.set('trust proxy', config.trustProxy)
  app.use(securityHeaders())
  // No JSON route takes more than a build sheet with its notes; uploads are multipart and have their own limit.
  app.use(express.json({ limit: JSON_BODY_LIMIT }))
  app.use(
    '/api',
    await createSessionMiddleware(dataSource, {
      secret: config.sessionSecret,
      secure: config.cookieSecure,
      maxAgeMs: config.sessionMaxAgeMs,
    }),
  )
  app.use('/api', auth.initialize(), auth.session())

  app.use('/api', csrfProtection())

  const api = express.Router()
  api.use(healthRoutes(version))
  api.use(authRoutes(auth, { throttle: createSignInThrottle(dataSource, config.loginLimits), events: services.securityEvents }))
  api.use(partRoutes(services.parts, services.partLookup))
  api.use(fitmentRoutes(services))
  api.use(substituteRoutes(services.substitutes))
  api.use(buildRoutes(services))
  api.use(linkRoutes(services.links))
  api.use(accountRoutes(services.accounts, services.ownPassword))
  api.use(userRoutes(services.users))
  api.use(securityEventRoutes(services.securityEvents))
  api.use(importRoutes(services, config))
  api.use(
    fieldReportRoutes(services, {
      photoMaxBytes: config.photoMaxBytes,
      uploadTempDir: path.join(path.dirname(config.uploadTempDir), 'photos-in-progress'),
    }),
  )
  api.use(mailRoutes(services.outbox))
  api.use(
    stockRoutes(services.stock, services.stockPhotos, {
      photoMaxBytes: config.photoMaxBytes,
      uploadTempDir: path.join(path.dirname(config.uploadTempDir), 'stock-photos-in-progress'),
    }),
  )
  api.use(vehicleRoutes(services.vehicles))
  api.use(quoteRoutes(services))
  api.use(sharedLinkRoutes(services.sharedLinks))
  api.use(requireSignIn, notFoundApi)
  app.use('/api', api)

  if (clientDir && existsSync(path.join(clientDir, 'index.html'))) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }))
    app.get(/^\/(?!api\/).*/, (req, res, next) => {
      // A missing file is a 404; only page addresses get the app (part numbers may hold dots, so by file type).
      if (STATIC_FILE.test(req.path)) return next()
      res.sendFile(path.join(clientDir, 'index.html'))
    })
    app.use((_req, res) => res.status(404).type('text/plain').send('Not found'))
  }
  app.use(errorHandler)
  return app
}
