/** The fit graph index: see graph/ (in-memory typed arrays, deltas, details by id). */
export { FitGraph, type GraphIdentity, type GraphLink, type GraphPart } from './graph/fit-graph'
export { FitGraphIndex, type CatalogueChanges } from './graph/graph-index'
export type { FitDetails, IdentityDetail, LinkDetail } from './graph/fit-details'
