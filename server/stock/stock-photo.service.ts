import { readFile } from 'node:fs/promises'
import type { StockPhoto } from '../../shared/schemas/stock'
import { AppError } from '../errors/app-error'
import { processPhoto } from '../field-reports/photo-processing'
import type { PhotoStorage } from '../field-reports/photo-storage'
import { type StockPhotoRepository, TooMany } from './stock-photo.repository'
import type { StockService } from './stock.service'

/** The most photos one unit keeps: enough for the damage, the marks and the donor plate. */
export const STOCK_PHOTO_MOST = 8

/**
 * Photos of a unit on the shelf, checked and re-encoded like a field report's
 * (no metadata leaves the shop) and kept in the same storage by key. The
 * rows go in one transaction; photos stored for a refused upload are removed.
 */
export class StockPhotoService {
  constructor(
    private readonly photos: StockPhotoRepository,
    private readonly storage: PhotoStorage,
    private readonly stock: StockService,
  ) {}

  async list(stockItemId: number): Promise<StockPhoto[]> {
    await this.stock.get(stockItemId)
    return (await this.photos.of(stockItemId)).map(({ id, width, height }) => ({ id, width, height }))
  }

  async add(stockItemId: number, files: { path: string; originalname: string }[]): Promise<StockPhoto[]> {
    await this.stock.get(stockItemId)
    if (files.length === 0) throw AppError.badRequest('Attach at least one photo in the form field "photos".')
    // Slow work first (decoding, re-encoding, writing files), then one short transaction.
    const processed = []
    for (const [index, file] of files.entries())
      processed.push(await processPhoto(await readFile(file.path), `Photo ${index + 1} (${file.originalname})`))
    const stored: string[] = []
    try {
      const rows = []
      for (const photo of processed) {
        const displayKey = await this.storage.put(photo.display, 'jpg')
        stored.push(displayKey)
        const thumbKey = await this.storage.put(photo.thumb, 'jpg')
        stored.push(thumbKey)
        rows.push({ displayKey, thumbKey, width: photo.width, height: photo.height })
      }
      await this.photos.add(stockItemId, rows, STOCK_PHOTO_MOST)
    } catch (error) {
      await this.storage.remove(stored)
      if (error instanceof TooMany) {
        throw AppError.badRequest(
          `A unit keeps at most ${STOCK_PHOTO_MOST} photos; this one has room for ${Math.max(0, error.room)} more.`,
          [{ path: 'photos', message: `At most ${STOCK_PHOTO_MOST} photos a unit.` }],
        )
      }
      throw error
    }
    return this.list(stockItemId)
  }

  async photo(stockItemId: number, photoId: number, size: 'display' | 'thumb'): Promise<Buffer> {
    const row = await this.photos.get(stockItemId, photoId)
    if (!row) throw AppError.notFound(`Stock item ${stockItemId} has no photo ${photoId}.`)
    return this.storage.get(size === 'thumb' ? row.thumbKey : row.displayKey)
  }

  async remove(stockItemId: number, photoId: number): Promise<void> {
    const row = await this.photos.get(stockItemId, photoId)
    if (!row || !(await this.photos.remove(stockItemId, photoId)))
      throw AppError.notFound(`Stock item ${stockItemId} has no photo ${photoId}.`)
    await this.storage.remove([row.displayKey, row.thumbKey])
  }
}
