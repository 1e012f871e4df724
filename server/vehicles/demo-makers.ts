/**
 * World manufacturer identifiers (VIN positions 1-3) of the demo scenario's
 * invented maker. Real assignments come from the registry that issues them and
 * are not shipped; a VIN from any other maker decodes with the maker unknown.
 */
export const DEMO_WMI: Readonly<Record<string, { maker: string; make: string }>> = {
  TMW: { maker: 'Talmark Motor Works', make: 'Talmark' },
  TM1: { maker: 'Talmark Motor Works', make: 'Talmark' },
}
