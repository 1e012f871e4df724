import { fileTypeFromBuffer } from 'file-type'
import sharp from 'sharp'
import { PHOTO_TYPES } from '../../shared/schemas/field-reports'
import { AppError } from '../errors/app-error'

export type ProcessedPhoto = { display: Buffer; thumb: Buffer; width: number; height: number }

const DISPLAY_EDGE = 1600
const THUMB_EDGE = 320
/** A photo larger than this many pixels is refused before decoding (a decompression bomb). */
const MAX_PIXELS = 60_000_000

/**
 * Checks a photo by its bytes (never its name or declared type), then
 * re-encodes it: turned upright by its orientation tag, resized, and written
 * without metadata, so positions and camera details never leave the shop.
 */
export async function processPhoto(bytes: Buffer, label: string): Promise<ProcessedPhoto> {
  const type = await fileTypeFromBuffer(bytes)
  if (!type || !(PHOTO_TYPES as readonly string[]).includes(type.mime)) {
    throw AppError.badRequest(`${label} is not a JPEG, PNG or WebP photo.`, [
      { path: 'photos', message: `${label}: use a JPEG, PNG or WebP photo.` },
    ])
  }
  try {
    const source = sharp(bytes, { limitInputPixels: MAX_PIXELS, failOn: 'error' }).rotate()
    const display = await source
      .clone()
      .resize({ width: DISPLAY_EDGE, height: DISPLAY_EDGE, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 82, mozjpeg: true })
      .toBuffer({ resolveWithObject: true })
    const thumb = await source
      .clone()
      .resize({ width: THUMB_EDGE, height: THUMB_EDGE, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 75 })
      .toBuffer()
    return { display: display.data, thumb, width: display.info.width, height: display.info.height }
  } catch {
    throw AppError.badRequest(`${label} could not be read as an image; it may be damaged.`, [
      { path: 'photos', message: `${label} could not be read as an image.` },
    ])
  }
}
