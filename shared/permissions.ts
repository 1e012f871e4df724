import type { Role } from './schemas/auth'
import { IMPORT_TYPES, type ImportType } from './schemas/imports'

/**
 * What each role may do, read by the server's route guards and by the client's
 * navigation, so the two never disagree.
 */
export const PERMISSIONS = {
  'catalogue.read': ['admin', 'editor', 'counter', 'tech'],
  'builds.evaluate': ['admin', 'editor', 'counter', 'tech'],
  'builds.save': ['admin', 'editor', 'tech'],
  'builds.see-all': ['admin', 'editor'],
  'catalogue.edit': ['admin', 'editor'],
  'imports.manage': ['admin', 'editor'],
  /** The imports screen: editors for every file, the counter for its stock book. */
  'imports.open': ['admin', 'editor', 'counter'],
  'users.manage': ['admin'],
  'field-reports.file': ['admin', 'editor', 'tech'],
  'field-reports.review': ['admin', 'editor'],
  'stock.manage': ['admin', 'editor', 'counter'],
  'quotes.share': ['admin', 'editor', 'counter'],
} as const satisfies Record<string, readonly Role[]>

export type Permission = keyof typeof PERMISSIONS

export function can(role: Role | undefined | null, permission: Permission): boolean {
  return !!role && (PERMISSIONS[permission] as readonly Role[]).includes(role)
}

/** The kinds of file a role may import, export and revert: every kind for editors, the stock book for the counter. */
export function importTypesFor(role: Role | undefined | null): ImportType[] {
  if (can(role, 'imports.manage')) return [...IMPORT_TYPES]
  return can(role, 'stock.manage') ? ['stock'] : []
}

export function rolesFor(permission: Permission): Role[] {
  return [...PERMISSIONS[permission]]
}
