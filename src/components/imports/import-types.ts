import type { ImportType } from '@shared/schemas/imports'

/** What the import screen calls each kind of file. */
export const IMPORT_TYPE_LABELS: Readonly<Record<ImportType, string>> = {
  parts: 'Parts',
  links: 'Links',
  vehicles: 'Vehicles',
  stock: 'Stock',
}
