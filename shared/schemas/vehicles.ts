import { z } from 'zod'
import { SLOT_IDS, type SlotId } from '../build-template'

const year = (what: string) =>
  z.coerce
    .number({ error: () => `${what} must be a year.` })
    .int(`${what} must be a whole year.`)
    .min(1950, `${what} must be 1950 or later.`)
    .max(2100, `${what} must be 2100 or earlier.`)
const name = (what: string) => z.string().trim().min(1, `Give the ${what}.`).max(80, `Keep the ${what} under 80 characters.`)

/** One vehicle application: the cars of some model years that left the factory with the same parts. */
export const vehicleInputSchema = z
  .strictObject({
    yearFrom: year('First model year'),
    yearTo: year('Last model year'),
    make: name('make'),
    model: name('model'),
    body: z.string().trim().max(80).default(''),
    market: z.string().trim().max(80).default(''),
    engineFamily: name('engine family'),
    /** The part number fitted at the factory, slot by slot. */
    originals: z.partialRecord(z.enum(SLOT_IDS as [SlotId, ...SlotId[]]), z.string().trim().min(1).max(100)).default({}),
  })
  .refine((v) => v.yearTo >= v.yearFrom, { path: ['yearTo'], message: 'The last model year cannot come before the first.' })
export type VehicleInput = z.infer<typeof vehicleInputSchema>

export const originalPartSchema = z.object({ slot: z.string(), partNumber: z.string(), name: z.string() })
export const vehicleSchema = z.object({
  id: z.number().int(),
  yearFrom: z.number().int(),
  yearTo: z.number().int(),
  make: z.string(),
  model: z.string(),
  body: z.string(),
  market: z.string(),
  engineFamily: z.string(),
  originals: z.array(originalPartSchema),
})
export type Vehicle = z.infer<typeof vehicleSchema>

export const vehicleQuerySchema = z.object({
  year: year('Year').optional(),
  make: z.string().trim().max(80).optional(),
  model: z.string().trim().max(80).optional(),
})
export type VehicleQuery = z.infer<typeof vehicleQuerySchema>

export const vehicleChoicesSchema = z.object({ makes: z.array(z.string()), models: z.array(z.string()) })
export type VehicleChoices = z.infer<typeof vehicleChoicesSchema>

export const vinAnswerSchema = z.object({
  vin: z.string(),
  checkDigit: z.object({ valid: z.boolean(), expected: z.string(), found: z.string() }),
  modelYear: z.number().int().nullable(),
  maker: z.string().nullable(),
  applications: z.array(vehicleSchema),
})
export type VinAnswer = z.infer<typeof vinAnswerSchema>
