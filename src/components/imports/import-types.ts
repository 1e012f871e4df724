import type { ImportType } from '@shared/schemas/imports'

/** What the import screen calls each kind of file. */
export const IMPORT_TYPE_LABELS: Readonly<Record<ImportType, string>> = {
  parts: 'Parts',
  links: 'Links',
  vehicles: 'Vehicles',
  stock: 'Stock',
}

/** What a batch of each kind writes, as the revert question names it. */
export const IMPORT_RECORDS: Readonly<Record<ImportType, string>> = {
  parts: 'part',
  links: 'link and identity',
  vehicles: 'vehicle application',
  stock: 'stock unit',
}
