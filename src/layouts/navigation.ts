import type { Role } from '@shared/schemas/auth'
import { can, type Permission } from '@shared/permissions'

export type NavigationLink = {
  name: string
  label: string
  icon: string
  permission: Permission
  /** Other routes that belong to the same area (the link shows as current there too). */
  area?: string[]
}

/** The app's main areas, each shown only to roles that may use it. */
export const NAVIGATION: NavigationLink[] = [
  { name: 'lookup', label: 'Look up', icon: 'pi-search', permission: 'catalogue.read', area: ['part', 'part-substitutes'] },
  { name: 'vehicles', label: 'Vehicles', icon: 'pi-car', permission: 'catalogue.read', area: ['vehicle'] },
  { name: 'stock', label: 'Stock', icon: 'pi-box', permission: 'stock.manage', area: ['stock-new', 'stock-unit'] },
  { name: 'parts', label: 'Catalogue', icon: 'pi-list', permission: 'catalogue.read' },
  { name: 'review', label: 'Review', icon: 'pi-check-square', permission: 'catalogue.edit' },
  { name: 'imports', label: 'Imports', icon: 'pi-file-import', permission: 'imports.open' },
  { name: 'graph-home', label: 'Fit graph', icon: 'pi-sitemap', permission: 'catalogue.read', area: ['graph', 'graph-path'] },
  { name: 'planner', label: 'Build planner', icon: 'pi-wrench', permission: 'builds.evaluate', area: ['planner-sheet'] },
  { name: 'builds', label: 'Build sheets', icon: 'pi-folder-open', permission: 'builds.save' },
  { name: 'quotes', label: 'Quotes', icon: 'pi-receipt', permission: 'builds.evaluate', area: ['quote'] },
  {
    name: 'field-reports',
    label: 'Field reports',
    icon: 'pi-camera',
    permission: 'field-reports.file',
    area: ['field-report', 'field-report-new'],
  },
  { name: 'users', label: 'Users', icon: 'pi-users', permission: 'users.manage' },
  { name: 'security-events', label: 'Security', icon: 'pi-shield', permission: 'users.manage' },
  { name: 'mail', label: 'Mail', icon: 'pi-envelope', permission: 'users.manage' },
  { name: 'shop-settings', label: 'Shop', icon: 'pi-building', permission: 'users.manage' },
]

export function navigationFor(role: Role | undefined): NavigationLink[] {
  return NAVIGATION.filter((link) => can(role, link.permission))
}

/** Whether a link stands for the area the current route is in. */
export function isCurrentArea(link: NavigationLink, routeName: string | symbol | null | undefined): boolean {
  return typeof routeName === 'string' && (routeName === link.name || (link.area ?? []).includes(routeName))
}
