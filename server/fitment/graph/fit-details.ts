import type { LinkSource } from '../../../shared/schemas/fitment'

/** What an answer shows of a link beyond what the graph holds. */
export type LinkDetail = { id: number; note: string; source: LinkSource; modifications: string[] }
export type IdentityDetail = { id: number; note: string; source: LinkSource }

/**
 * Reads the details of the few links and identities an answer shows, by id
 * (the graph keeps none of them, so a million links stay small in memory).
 */
export interface FitDetails {
  links(ids: readonly number[]): Promise<Map<number, LinkDetail>>
  identities(ids: readonly number[]): Promise<Map<number, IdentityDetail>>
}
