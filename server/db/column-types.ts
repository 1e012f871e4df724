/**
 * Column types that differ between the two drivers, for entities shared by
 * both. Dates use `type: Date` (TypeORM maps it to datetime on SQLite and
 * timestamp on PostgreSQL); a REAL on PostgreSQL would be single precision.
 */
const postgres = /^postgres(ql)?:\/\//.test(process.env.FITWRIGHT_DATABASE_URL ?? '')

export const FLOAT_COLUMN = postgres ? 'double precision' : 'real'
