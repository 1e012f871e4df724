import { readdirSync } from 'node:fs'
import exifr from 'exifr'
import sharp from 'sharp'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let counter: Awaited<ReturnType<TestApp['signIn']>>
let unitId = 0
beforeAll(async () => {
  t = await createTestApp()
  counter = await t.signIn('counter')
  unitId = ((await counter.get('/api/stock/label/NG-000112')).body as { id: number }).id
})
afterAll(() => t.close())

/** A photo as a shop phone makes one: JPEG with the camera's make and a GPS position in its EXIF. */
function phonePhoto(width = 640, height = 480) {
  return sharp({ create: { width, height, channels: 3, background: '#5a6b45' } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'Shopcam', Model: 'Counter 1' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' },
    })
    .toBuffer()
}

const upload = (photos: { bytes: Buffer; name: string }[], agent = counter, id = unitId) => {
  const call = agent.post(`/api/stock/${id}/photos`)
  for (const photo of photos) call.attach('photos', photo.bytes, photo.name)
  return call
}
const stored = () => {
  try {
    return readdirSync(t.config.uploadDir).length
  } catch {
    return 0
  }
}

describe('photos of a unit on the shelf', () => {
  let photoId = 0

  it('takes a counter’s photo of a unit, re-encoded without its GPS position or camera, with a thumbnail', async () => {
    const taken = await phonePhoto()
    expect((await exifr.parse(taken, { gps: true, tiff: true }))?.Make).toBe('Shopcam')
    const response = await upload([{ bytes: taken, name: 'boss.jpg' }])
    expect(response.status, JSON.stringify(response.body)).toBe(201)
    expect(response.body).toEqual([{ id: expect.any(Number), width: 640, height: 480 }])
    photoId = response.body[0].id

    const tech = await t.signIn('tech')
    const display = await tech.get(`/api/stock/${unitId}/photos/${photoId}`).buffer(true)
    expect(display.status).toBe(200)
    expect(display.headers['content-type']).toBe('image/jpeg')
    const metadata = await exifr.parse(display.body as Buffer, { gps: true, tiff: true }).catch(() => undefined)
    expect(metadata?.latitude).toBeUndefined()
    expect(metadata?.Make).toBeUndefined()
    const thumb = await tech.get(`/api/stock/${unitId}/photos/${photoId}?size=thumb`).buffer(true)
    expect((await sharp(thumb.body as Buffer).metadata()).width).toBe(320)
    expect((await tech.get(`/api/stock/${unitId}/photos`)).body).toHaveLength(1)
  })

  it('refuses bytes that are not a photo, a ninth photo and a tech’s upload, storing nothing', async () => {
    const before = stored()
    const fake = await upload([{ bytes: Buffer.from('not a photo at all'), name: 'boss.jpg' }])
    expect(fake.status).toBe(400)
    expect(fake.body.error.message).toContain('is not a JPEG, PNG or WebP photo')
    const bytes = await phonePhoto(64, 48)
    const eight = Array.from({ length: 8 }, (_, i) => ({ bytes, name: `p${i}.jpg` }))
    const tooMany = await upload(eight)
    expect(tooMany.status).toBe(400)
    expect(tooMany.body.error.message).toContain('room for 7 more')
    expect((await upload([{ bytes, name: 'x.jpg' }], await t.signIn('tech'))).status).toBe(403)
    expect(stored()).toBe(before)
    expect((await counter.get(`/api/stock/${unitId}/photos`)).body).toHaveLength(1)
  })

  it('answers 404 for an unknown unit or photo, and removes a photo with its files', async () => {
    expect((await upload([{ bytes: await phonePhoto(64, 48), name: 'x.jpg' }], counter, 999_999)).status).toBe(404)
    expect((await counter.get(`/api/stock/${unitId}/photos/999999`)).status).toBe(404)
    const before = stored()
    expect((await counter.delete(`/api/stock/${unitId}/photos/${photoId}`)).status).toBe(204)
    expect(stored()).toBe(before - 2)
    expect((await counter.get(`/api/stock/${unitId}/photos`)).body).toEqual([])
    expect((await counter.get(`/api/stock/${unitId}/photos/${photoId}`)).status).toBe(404)
  })
})
