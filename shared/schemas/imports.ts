import { z } from 'zod'

export const IMPORT_TYPES = ['parts', 'links', 'vehicles', 'stock'] as const
export const importTypeSchema = z.enum(IMPORT_TYPES, { error: () => 'Type must be parts, links, vehicles or stock.' })
export type ImportType = z.infer<typeof importTypeSchema>

export const IMPORT_MODES = ['preview', 'commit'] as const
export const importModeSchema = z.enum(IMPORT_MODES, { error: () => 'Mode must be preview or commit.' })
export type ImportMode = z.infer<typeof importModeSchema>

export type ImportBatchStatus = 'committed' | 'reverted'

/** The text fields of the multipart upload (the file itself travels beside them). */
export const importFieldsSchema = z.object({
  type: importTypeSchema,
  mode: importModeSchema.default('preview'),
  /** Commit the valid rows of a file that has rejected rows; without it such a file is refused whole. */
  validRowsOnly: z
    .enum(['0', '1', 'true', 'false'], { error: () => 'Use true or false.' })
    .default('false')
    .transform((value) => value === '1' || value === 'true'),
})
export type ImportFields = z.output<typeof importFieldsSchema>

export const importCountsSchema = z.object({
  created: z.number().int(),
  updated: z.number().int(),
  unchanged: z.number().int(),
  rejected: z.number().int(),
})
export type ImportCounts = z.infer<typeof importCountsSchema>

/** Row 1 is the header, so row numbers match a spreadsheet's. */
export const importIssueSchema = z.object({ row: z.number().int(), column: z.string(), message: z.string() })
export type ImportIssue = z.infer<typeof importIssueSchema>

export const fieldChangeSchema = z.object({ field: z.string(), before: z.string(), after: z.string() })
export type FieldChange = z.infer<typeof fieldChangeSchema>

/** What one row does (or would do) to the catalogue. */
export const rowChangeSchema = z.object({
  row: z.number().int(),
  key: z.string(),
  action: z.enum(['create', 'update']),
  fields: z.array(fieldChangeSchema),
})
export type RowChange = z.infer<typeof rowChangeSchema>

export const importResultSchema = z.object({
  batchId: z.number().int().optional(),
  counts: importCountsSchema,
  errors: z.array(importIssueSchema),
  changes: z.array(rowChangeSchema),
  /** How many errors and changes were left out of the lists above to keep the answer small. */
  omitted: z.object({ errors: z.number().int(), changes: z.number().int() }),
})
export type ImportResult = z.infer<typeof importResultSchema>

/** Lines of the NDJSON answer a client gets when it asks for progress. */
export const IMPORT_PHASES = ['read', 'check', 'write'] as const
export type ImportPhase = (typeof IMPORT_PHASES)[number]
export const importProgressSchema = z.object({
  type: z.literal('progress'),
  phase: z.enum(IMPORT_PHASES),
  done: z.number(),
  total: z.number(),
})
export type ImportProgress = z.infer<typeof importProgressSchema>
export const importStreamLineSchema = z.discriminatedUnion('type', [
  importProgressSchema,
  z.object({ type: z.literal('result'), status: z.number().int(), body: z.unknown() }),
  z.object({ type: z.literal('error'), status: z.number().int(), body: z.unknown() }),
])
export type ImportStreamLine = z.infer<typeof importStreamLineSchema>

export const importBatchSchema = z.object({
  id: z.number().int(),
  type: importTypeSchema,
  fileName: z.string(),
  fileHash: z.string(),
  userName: z.string(),
  createdAt: z.string(),
  counts: importCountsSchema,
  validRowsOnly: z.boolean(),
  status: z.enum(['committed', 'reverted']),
  revertedAt: z.string().nullable(),
  revertedByName: z.string().nullable(),
})
export type ImportBatch = z.infer<typeof importBatchSchema>
export const importBatchListSchema = z.array(importBatchSchema)

export const EXPORT_FILES = ['parts.csv', 'links.csv', 'vehicles.csv', 'stock.csv'] as const
export type ExportFile = (typeof EXPORT_FILES)[number]
