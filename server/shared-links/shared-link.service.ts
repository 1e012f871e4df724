import { createHash, randomBytes } from 'node:crypto'
import type { Database } from '../db/database'
import { toIsoTime } from '../db/database'
import { AppError } from '../errors/app-error'
import type { OutboxService } from '../mail/outbox.service'
import type { BuildSheetService } from '../builds/build-sheet.service'
import type { QuoteService } from '../quotes/quote.service'
import type { User } from '../../shared/schemas/auth'
import { SHARE_DAYS, type ShareAnswer, type SharedView } from '../../shared/schemas/shared-links'
import type { SharedLinkKind } from './shared-link.entity'
import type { SharedLinkRepository } from './shared-link.repository'
import { sharedLinkMessage, sharedLinkUrl } from './shared-link-mail'

const DAY_MS = 86_400_000
const UNKNOWN = 'This link is not known. Check that it was copied whole, or ask the sender for a new one.'
const EXPIRED = 'This link has expired. Ask the sender to share it again.'
const GONE = 'What this link showed has been deleted. Ask the sender for a new link.'

function sha256(token: string): string {
  return createHash('sha256').update(token).digest('hex')
}

/**
 * Read-only links to a build sheet or a quote, sent by mail. The token is
 * random and lives only in the mail (its hash in the table); the link opens
 * the item without an account until it expires, and never lets anyone change it.
 */
export class SharedLinkService {
  constructor(
    private readonly db: Database,
    private readonly links: SharedLinkRepository,
    private readonly deps: {
      sheets: BuildSheetService
      quotes: QuoteService
      outbox: OutboxService
      publicUrl: string
      clock?: () => Date
    },
  ) {}

  private now(): Date {
    return this.deps.clock?.() ?? new Date()
  }

  /** Shares a sheet its owner (or an editor or administrator) can open. */
  async shareSheet(id: number, input: { email: string; days?: number }, user: User): Promise<ShareAnswer> {
    const sheet = await this.deps.sheets.get(id, user)
    return this.share('sheet', id, sheet.name, input, user)
  }

  async shareQuote(id: number, input: { email: string; days?: number }, user: User): Promise<ShareAnswer> {
    const quote = await this.deps.quotes.get(id)
    const title = [quote.buildName ?? `Quote ${quote.id}`, quote.customer && `for ${quote.customer}`].filter(Boolean).join(' ')
    return this.share('quote', id, title, input, user)
  }

  /** The link row and its mail in one transaction: no link without its mail, no mail without its link. */
  private async share(
    kind: SharedLinkKind,
    targetId: number,
    title: string,
    input: { email: string; days?: number },
    user: User,
  ): Promise<ShareAnswer> {
    const days = input.days ?? SHARE_DAYS.default
    const token = randomBytes(32).toString('base64url')
    const now = this.now()
    const expiresAt = new Date(now.getTime() + days * DAY_MS)
    const message = sharedLinkMessage({ kind, title, sharedBy: user.name, url: sharedLinkUrl(this.deps.publicUrl, token), days, expiresAt })
    const id = await this.db.transaction(async (tx) => {
      const linkId = await this.links.insert(
        tx,
        { kind, targetId, tokenHash: sha256(token), expiresAt, sharedById: user.id, recipient: input.email },
        now,
      )
      await this.deps.outbox.enqueue({ kind: `shared-${kind}`, recipient: input.email, ...message })
      return linkId
    })
    return { id, kind, recipient: input.email, expiresAt: expiresAt.toISOString() }
  }

  /** What a link shows: 404 for a token nobody issued, 410 once it has expired or its item was deleted. */
  async open(token: string): Promise<SharedView> {
    const link = await this.links.findByHash(sha256(token))
    if (!link) throw new AppError(404, 'link_unknown', UNKNOWN)
    const expiresAt = toIsoTime(link.expiresAt)
    if (new Date(expiresAt).getTime() <= this.now().getTime()) throw new AppError(410, 'link_expired', EXPIRED)
    const common = { sharedBy: link.sharedBy, expiresAt }
    if (link.kind === 'sheet') {
      const found = await this.deps.sheets.forSharedLink(link.targetId)
      if (!found) throw new AppError(410, 'link_gone', GONE)
      const { name, slots, targetPowerKw, fuelOctane, chassisModelYear, vin, faceFinish, notes, updatedAt } = found.sheet
      return {
        kind: 'sheet',
        ...common,
        sheet: { name, slots, targetPowerKw, fuelOctane, chassisModelYear, vin, faceFinish, notes, updatedAt },
        evaluation: found.evaluation,
      }
    }
    const quote = await this.deps.quotes.get(link.targetId).catch((error: unknown) => {
      if (error instanceof AppError && error.status === 404) throw new AppError(410, 'link_gone', GONE)
      throw error
    })
    return { kind: 'quote', ...common, quote }
  }
}
