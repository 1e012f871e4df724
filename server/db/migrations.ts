import { CatalogueChangeFeed1796197600000 } from '../migrations/postgres/1796197600000-CatalogueChangeFeed'
import { Foundation1796197547678 as PostgresFoundation1796197547678 } from '../migrations/postgres/1796197547678-Foundation'
import { CsvImport1796154117731 } from '../migrations/1796154117731-CsvImport'
import { FitmentGraph1796151639561 } from '../migrations/1796151639561-FitmentGraph'
import { Foundation1796150879975 } from '../migrations/1796150879975-Foundation'
import { PartWords1796197875848 } from '../migrations/1796197875848-PartWords'
import { BuildSheetChecklist1796214415051 } from '../migrations/1796214415051-BuildSheetChecklist'
import { BuildSheetChecklist1796214105800 as PostgresBuildSheetChecklist1796214105800 } from '../migrations/postgres/1796214105800-BuildSheetChecklist'

/** SQLite's, in the order they run. */
export const migrations = [
  Foundation1796150879975,
  FitmentGraph1796151639561,
  CsvImport1796154117731,
  PartWords1796197875848,
  BuildSheetChecklist1796214415051,
]

/** PostgreSQL's, generated from the same entities (`npx tsx server/db/generate-migration.ts Name --postgres`). */
export const postgresMigrations = [
  PostgresFoundation1796197547678,
  CatalogueChangeFeed1796197600000,
  PostgresBuildSheetChecklist1796214105800,
]
