import type { Caution } from './schemas/build'

/** Said with every build verdict, whatever the rules find: the product supports, never replaces, the trade's own sources. */
export const DEFERENCE: Caution = {
  severity: 'info',
  text: 'Verdicts and figures support, and never replace, the service manual, local codes and licensed practice.',
}
