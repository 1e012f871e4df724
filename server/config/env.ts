import path from 'node:path'
import { z } from 'zod'

const flag = z
  .enum(['0', '1', 'true', 'false', 'on', 'off'], { error: () => 'Use 1 or 0.' })
  .transform((value) => ['1', 'true', 'on'].includes(value))

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('0.0.0.0'),
  FITWRIGHT_DB_PATH: z.string().min(1).default('data/fitwright.sqlite'),
  FITWRIGHT_DATABASE_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, 'Use a postgres:// address, or leave it unset for the embedded SQLite file.')
    .optional(),
  FITWRIGHT_DEMO: flag.default(true),
  FITWRIGHT_SESSION_SECRET: z.string().min(16, 'Use at least 16 characters.').optional(),
  FITWRIGHT_ADMIN_EMAIL: z.email().optional(),
  FITWRIGHT_ADMIN_PASSWORD: z.string().min(10, 'Use at least 10 characters.').optional(),
  FITWRIGHT_SESSION_MAX_AGE_DAYS: z.coerce.number().positive('Use a number of days above 0.').max(366).default(7),
  FITWRIGHT_LOGIN_ATTEMPTS: z.coerce.number().int().positive().default(10),
  FITWRIGHT_LOGIN_ATTEMPTS_PER_ADDRESS: z.coerce.number().int().positive().default(30),
  FITWRIGHT_RESET_MAILS_PER_EMAIL: z.coerce.number().int().positive().default(3),
  FITWRIGHT_RESET_REQUESTS_PER_ADDRESS: z.coerce.number().int().positive().default(20),
  FITWRIGHT_IMPORT_MAX_BYTES: z.coerce
    .number()
    .int()
    .positive()
    .default(50 * 1024 * 1024),
  FITWRIGHT_COOKIE_SECURE: z.enum(['0', '1', 'true', 'false', 'on', 'off', 'auto'], { error: () => 'Use 1, 0 or auto.' }).optional(),
  FITWRIGHT_TRUST_PROXY: z
    .string()
    .trim()
    .regex(/^[\w.:/, -]+$/, 'Use loopback, a number of proxies, addresses or subnets separated by commas, or false.')
    .default('loopback'),
  FITWRIGHT_IMPORT_MAX_ROWS: z.coerce.number().int().positive().default(500_000),
  FITWRIGHT_SMTP_URL: z
    .string()
    .regex(/^smtps?:\/\//, 'Use an smtp:// or smtps:// address, or leave it unset for the local mail fake.')
    .optional(),
  FITWRIGHT_MAIL_DIR: z.string().min(1).default('data/mail'),
  FITWRIGHT_MAIL_FROM: z.string().min(3).default('Fitwright <fitwright@localhost>'),
  FITWRIGHT_PUBLIC_URL: z.url('Use the address people open Fitwright at, like https://parts.example.test.').optional(),
  FITWRIGHT_UPLOAD_DIR: z.string().min(1).default('data/uploads'),
  FITWRIGHT_PHOTO_MAX_BYTES: z.coerce
    .number()
    .int()
    .positive()
    .default(10 * 1024 * 1024),
})

export type AppConfig = {
  env: 'development' | 'production' | 'test'
  port: number
  host: string
  dbPath: string
  /** A PostgreSQL database shared by several servers; unset: the SQLite file at dbPath. */
  databaseUrl?: string
  demo: boolean
  sessionSecret?: string
  /** A session ends this long after sign-in however often it is used (the idle end is eight hours). */
  sessionMaxAgeMs: number
  importMaxBytes: number
  importMaxRows: number
  /** SMTP server for mail; unset: the local fake, keeping each message as a file in mailDir. */
  smtpUrl?: string
  mailDir: string
  mailFrom: string
  /** Where links in mail point. */
  publicUrl: string
  /** Field-report photos (re-encoded) are kept here. */
  uploadDir: string
  photoMaxBytes: number
  /** Failed sign-ins allowed in 15 minutes per address and e-mail, and per address across e-mails. */
  loginLimits: { perAccount: number; perAddress: number }
  /** "Forgot password" in an hour: mails to one e-mail, and requests from one address. */
  resetLimits: { perEmail: number; perAddress: number }
  /** This server's own folder for uploads in progress, beside the database file; emptied at start-up. */
  uploadTempDir: string
  /** Session cookie marked Secure: always, never (plain HTTP), or when the request came over HTTPS. */
  cookieSecure: boolean | 'auto'
  /** Express's `trust proxy`: which proxies may tell the client's address and protocol. */
  trustProxy: boolean | number | string
  /** First administrator, created when the database has no users (for use without the demo). */
  firstAdmin?: { email: string; password: string }
}

/** Reads the environment once at start-up; a bad value stops start-up with its name. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const parsed = envSchema.safeParse(env)
  if (!parsed.success) {
    const problems = parsed.error.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`)
    throw new Error(`Invalid configuration:\n  ${problems.join('\n  ')}`)
  }
  const value = parsed.data
  return {
    env: value.NODE_ENV,
    port: value.PORT,
    host: value.HOST,
    dbPath: value.FITWRIGHT_DB_PATH,
    databaseUrl: value.FITWRIGHT_DATABASE_URL,
    demo: value.FITWRIGHT_DEMO,
    sessionSecret: value.FITWRIGHT_SESSION_SECRET,
    sessionMaxAgeMs: Math.round(value.FITWRIGHT_SESSION_MAX_AGE_DAYS * 24 * 60 * 60 * 1000),
    importMaxBytes: value.FITWRIGHT_IMPORT_MAX_BYTES,
    importMaxRows: value.FITWRIGHT_IMPORT_MAX_ROWS,
    smtpUrl: value.FITWRIGHT_SMTP_URL,
    mailDir: value.FITWRIGHT_MAIL_DIR,
    mailFrom: value.FITWRIGHT_MAIL_FROM,
    publicUrl: (value.FITWRIGHT_PUBLIC_URL ?? `http://localhost:${value.PORT || 3000}`).replace(/\/$/, ''),
    uploadDir: value.FITWRIGHT_UPLOAD_DIR,
    photoMaxBytes: value.FITWRIGHT_PHOTO_MAX_BYTES,
    loginLimits: { perAccount: value.FITWRIGHT_LOGIN_ATTEMPTS, perAddress: value.FITWRIGHT_LOGIN_ATTEMPTS_PER_ADDRESS },
    resetLimits: { perEmail: value.FITWRIGHT_RESET_MAILS_PER_EMAIL, perAddress: value.FITWRIGHT_RESET_REQUESTS_PER_ADDRESS },
    uploadTempDir: path.join(path.dirname(value.FITWRIGHT_DB_PATH), 'uploads-in-progress'),
    cookieSecure: cookieSecure(value.FITWRIGHT_COOKIE_SECURE, value.NODE_ENV),
    trustProxy: trustProxy(value.FITWRIGHT_TRUST_PROXY),
    firstAdmin:
      value.FITWRIGHT_ADMIN_EMAIL && value.FITWRIGHT_ADMIN_PASSWORD
        ? { email: value.FITWRIGHT_ADMIN_EMAIL, password: value.FITWRIGHT_ADMIN_PASSWORD }
        : undefined,
  }
}

/** Secure by default in production; plain HTTP there has to be asked for. */
function cookieSecure(value: string | undefined, env: AppConfig['env']): boolean | 'auto' {
  if (value === undefined) return env === 'production' ? true : 'auto'
  if (value === 'auto') return 'auto'
  return ['1', 'true', 'on'].includes(value)
}

function trustProxy(value: string): boolean | number | string {
  if (value === 'true' || value === 'false') return value === 'true'
  if (/^\d+$/.test(value)) return Number(value)
  return value
}
