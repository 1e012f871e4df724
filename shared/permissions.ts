import type { Role } from './schemas/auth'

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

export function rolesFor(permission: Permission): Role[] {
  return [...PERMISSIONS[permission]]
}
