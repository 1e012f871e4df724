import { z } from 'zod'
import { partKindSchema } from './part-kinds'
import { relationSchema, reviewStatusSchema } from './fitment'

export const graphNodeSchema = z.object({
  id: z.string(),
  partNumber: z.string(),
  name: z.string(),
  kind: partKindSchema,
  family: z.string(),
  distance: z.number().int(),
})
export type GraphNode = z.infer<typeof graphNodeSchema>

export const graphEdgeSchema = z.object({
  id: z.string(),
  source: z.string(),
  target: z.string(),
  type: z.enum(['link', 'identity']),
  relation: relationSchema.optional(),
  review: reviewStatusSchema.optional(),
  note: z.string().optional(),
  modifications: z.array(z.string()).optional(),
})
export type GraphEdge = z.infer<typeof graphEdgeSchema>

export const MAX_NEIGHBOURHOOD_NODES = 600
export const MAX_NEIGHBOURHOOD_EDGES = 1400

export const neighbourhoodQuerySchema = z.object({
  depth: z.coerce
    .number()
    .int()
    .refine((value) => value === 1 || value === 2, 'Depth must be 1 or 2.')
    .default(1),
})

export const neighbourhoodSchema = z.object({
  centre: z.string(),
  depth: z.number().int(),
  nodes: z.array(graphNodeSchema),
  edges: z.array(graphEdgeSchema),
  capped: z.boolean(),
  message: z.string().optional(),
})
export type Neighbourhood = z.infer<typeof neighbourhoodSchema>

export const pathQuerySchema = z.object({
  from: z.string().trim().min(1, 'Give the part number to start from.').max(100),
  to: z.string().trim().min(1, 'Give the part number to reach.').max(100),
})

export const pathSchema = z.object({
  from: z.string(),
  to: z.string(),
  found: z.boolean(),
  nodes: z.array(graphNodeSchema),
  edges: z.array(graphEdgeSchema),
  message: z.string(),
})
export type GraphPath = z.infer<typeof pathSchema>
