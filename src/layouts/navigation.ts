import type { Role } from '@shared/schemas/auth'
import { can, type Permission } from '@shared/permissions'

export type NavigationLink = { name: string; label: string; icon: string; permission: Permission }

/** The app's main areas, each shown only to roles that may use it. */
export const NAVIGATION: NavigationLink[] = [
  { name: 'parts', label: 'Catalogue', icon: 'pi-list', permission: 'catalogue.read' },
  { name: 'imports', label: 'Imports', icon: 'pi-file-import', permission: 'imports.manage' },
  { name: 'users', label: 'Users', icon: 'pi-users', permission: 'users.manage' },
]

export function navigationFor(role: Role | undefined): NavigationLink[] {
  return NAVIGATION.filter((link) => can(role, link.permission))
}
