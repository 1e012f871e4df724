import { readdirSync } from 'node:fs'
import exifr from 'exifr'
import sharp from 'sharp'
import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let tech: Awaited<ReturnType<TestApp['signIn']>>
beforeEach(async () => {
  t = await createTestApp()
  tech = await t.signIn('tech')
})
afterEach(() => t.close())

const PAIR = { from: 'TM-HD-2000', to: 'TM-BL-1800', relation: 'fits-with-modification', modifications: ['oil-restrictor-fit'] }

/** A photo as a shop phone makes one: JPEG with the camera's make and a GPS position in its EXIF. */
function phonePhoto(width = 640, height = 480) {
  return sharp({ create: { width, height, channels: 3, background: '#7a6a50' } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'Shopcam', Model: 'Bench 3' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' },
    })
    .toBuffer()
}

function file(report: unknown, photos: { bytes: Buffer; name: string }[] = [], agent = tech) {
  const call = agent.post('/api/field-reports').field('report', typeof report === 'string' ? report : JSON.stringify(report))
  for (const photo of photos) call.attach('photos', photo.bytes, photo.name)
  return call
}

const storedFiles = () => {
  try {
    return readdirSync(t.config.uploadDir)
  } catch {
    return []
  }
}

describe('POST /api/field-reports', () => {
  it('files a report by a casting mark with photos re-encoded without their GPS position or camera details', async () => {
    const png = await sharp({ create: { width: 2400, height: 1200, channels: 3, background: '#335577' } })
      .png()
      .toBuffer()
    const response = await file(
      {
        pairs: [{ ...PAIR, from: 'H20-3180', note: 'Two washers under bolt 7.' }],
        vehicle: { modelYear: 1996, mileageKm: 182000 },
        measurements: [{ name: 'bolt projection', value: 2.1, unit: 'mm' }],
        notes: 'Ran 300 km since, no leaks.',
      },
      [
        { bytes: await phonePhoto(), name: 'IMG_0001.jpg' },
        { bytes: png, name: 'bench.png' },
      ],
    )
    expect(response.status, JSON.stringify(response.body)).toBe(201)
    const report = response.body
    expect(report).toMatchObject({ status: 'submitted', reporter: { name: expect.any(String) }, warnings: [] })
    // The mark resolves to the catalogue's own number.
    expect(report.pairs[0]).toMatchObject({ from: 'TM-HD-2000', to: 'TM-BL-1800', note: 'Two washers under bolt 7.' })
    expect(report.photos).toHaveLength(2)
    expect(report.photos[1]).toMatchObject({ width: 1600, height: 800 })

    const display = await tech.get(`/api/field-reports/${report.id}/photos/${report.photos[0].id}`).buffer(true)
    expect(display.status).toBe(200)
    expect(display.headers['content-type']).toBe('image/jpeg')
    const metadata = await exifr.parse(display.body as Buffer, { gps: true, tiff: true }).catch(() => undefined)
    expect(metadata?.latitude).toBeUndefined()
    expect(metadata?.Make).toBeUndefined()
    const thumb = await tech.get(`/api/field-reports/${report.id}/photos/${report.photos[1].id}?size=thumb`).buffer(true)
    const thumbSize = await sharp(thumb.body as Buffer).metadata()
    expect([thumbSize.width, thumbSize.height]).toEqual([320, 160])
    // The source photo really carried a position: the check above is not vacuous.
    expect((await exifr.parse(await phonePhoto(), { gps: true })).latitude).toBeCloseTo(51.5)
    expect(storedFiles()).toHaveLength(4)
  })

  it('keeps a report whose VIN check digit is wrong, with a warning naming position 9', async () => {
    const response = await file({ pairs: [PAIR], vehicle: { vin: '1G4AH59H55G118341' } })
    expect(response.status).toBe(201)
    expect(response.body.warnings).toEqual([expect.stringContaining('position 9')])
  })

  it.each([
    ['a text file named like a photo', Buffer.from('not a photo at all, just words'), 'fake.jpg', /not a JPEG, PNG or WebP/],
    [
      'a JPEG cut off after its header',
      Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46, 0, 1, 1, 0, 0, 1]),
      'cut.jpg',
      /could not be read/,
    ],
  ])('refuses %s with 400 and writes no report and no file', async (_what, bytes, name, message) => {
    const before = (await tech.get('/api/field-reports')).body.total
    const good = { bytes: await phonePhoto(), name: 'good.jpg' }
    const response = await file({ pairs: [PAIR] }, [good, { bytes, name }])
    expect(response.status).toBe(400)
    expect(response.body.error.message).toMatch(message)
    expect((await tech.get('/api/field-reports')).body.total).toBe(before)
    expect(storedFiles()).toEqual([])
  })

  it('refuses a ninth photo', async () => {
    const bytes = await phonePhoto(32, 32)
    const photos = Array.from({ length: 9 }, (_, i) => ({ bytes, name: `p${i}.jpg` }))
    const response = await file({ pairs: [PAIR] }, photos)
    expect(response.status).toBe(400)
    expect(response.body.error.message).toContain('at most 8 photos')
  })

  it('refuses a photo over the configured size with 413', async () => {
    await t.close()
    t = await createTestApp({ env: { FITWRIGHT_PHOTO_MAX_BYTES: '2000' } })
    tech = await t.signIn('tech')
    const response = await file({ pairs: [PAIR] }, [{ bytes: await phonePhoto(800, 600), name: 'big.jpg' }])
    expect(response.status).toBe(413)
    expect(response.body.error.message).toMatch(/larger than/)
  })

  it('names the unknown part and the missing modification by their field', async () => {
    const unknown = await file({ pairs: [{ ...PAIR, to: 'TM-NOPE-1' }] })
    expect(unknown.status).toBe(400)
    expect(unknown.body.error.details).toEqual([{ path: 'pairs.0.to', message: 'Unknown part number "TM-NOPE-1".' }])
    const bare = await file({ pairs: [{ ...PAIR, modifications: [] }] })
    expect(bare.status).toBe(400)
    expect(bare.body.error.details[0].path).toBe('pairs.0.modifications')
    expect((await file('{not json')).status).toBe(400)
    expect((await tech.get('/api/field-reports')).body.total).toBe(0)
  })
})

describe('who sees which field reports', () => {
  it('shows a tech their own reports only, editors all, and keeps counters out', async () => {
    const editor = await t.signIn('editor')
    const mine = await file({ pairs: [PAIR] })
    const theirs = await file({ pairs: [{ from: 'TM-HD-2000', to: 'TM-BL-2000', relation: 'fits' }] }, [], editor)
    expect([mine.status, theirs.status]).toEqual([201, 201])
    const techList = (await tech.get('/api/field-reports')).body
    expect(techList.items.map((r: { id: number }) => r.id)).toEqual([mine.body.id])
    expect((await tech.get(`/api/field-reports/${theirs.body.id}`)).status).toBe(404)
    const editorList = (await editor.get('/api/field-reports?status=submitted')).body
    expect(editorList.items.map((r: { id: number }) => r.id)).toEqual([theirs.body.id, mine.body.id])
    expect((await editor.get('/api/field-reports?status=approved')).body.total).toBe(0)
    expect((await editor.get('/api/field-reports?status=done')).status).toBe(400)
    const counter = await t.signIn('counter')
    expect((await counter.get('/api/field-reports')).status).toBe(403)
    expect((await file({ pairs: [PAIR] }, [], counter)).status).toBe(403)
  })
})
