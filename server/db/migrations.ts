import { Foundation1796150879975 } from '../migrations/1796150879975-Foundation'

/** In the order they run. */
export const migrations = [Foundation1796150879975]
