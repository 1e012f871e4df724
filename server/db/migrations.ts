import { StockPhotos1796229010828 } from '../migrations/1796229010828-StockPhotos'
import { CounterFinish1796235249342 } from '../migrations/1796235249342-CounterFinish'
import { FaceFinish1796279666605 } from '../migrations/1796279666605-FaceFinish'
import { WordPartIndex1796291212029 } from '../migrations/1796291212029-WordPartIndex'
import { FaceFinish1796279676351 as PostgresFaceFinish1796279676351 } from '../migrations/postgres/1796279676351-FaceFinish'
import { WordPartIndex1796291213360 as PostgresWordPartIndex1796291213360 } from '../migrations/postgres/1796291213360-WordPartIndex'
import { StockChangeFeed1796300000000 } from '../migrations/postgres/1796300000000-StockChangeFeed'
import { StockPhotos1796229013832 as PostgresStockPhotos1796229013832 } from '../migrations/postgres/1796229013832-StockPhotos'
import { CounterFinish1796235252157 as PostgresCounterFinish1796235252157 } from '../migrations/postgres/1796235252157-CounterFinish'
import { AccountTokens1796223315452 } from '../migrations/1796223315452-AccountTokens'
import { AccountTokens1796223318439 as PostgresAccountTokens1796223318439 } from '../migrations/postgres/1796223318439-AccountTokens'
import { Quotes1796215187917 } from '../migrations/1796215187917-Quotes'
import { PartListPrice1796226633835 } from '../migrations/1796226633835-PartListPrice'
import { SharedLinks1796227511872 } from '../migrations/1796227511872-SharedLinks'
import { SharedLinks1796227515397 as PostgresSharedLinks1796227515397 } from '../migrations/postgres/1796227515397-SharedLinks'
import { PartListPrice1796226637373 as PostgresPartListPrice1796226637373 } from '../migrations/postgres/1796226637373-PartListPrice'
import { Quotes1796215189078 as PostgresQuotes1796215189078 } from '../migrations/postgres/1796215189078-Quotes'
import { ImportVehiclesStock1796223370557 } from '../migrations/1796223370557-ImportVehiclesStock'
import { ImportVehiclesStock1796223379484 as PostgresImportVehiclesStock1796223379484 } from '../migrations/postgres/1796223379484-ImportVehiclesStock'
import { Vehicles1796213931900 } from '../migrations/1796213931900-Vehicles'
import { Vehicles1796213933784 as PostgresVehicles1796213933784 } from '../migrations/postgres/1796213933784-Vehicles'
import { Stock1796213287641 } from '../migrations/1796213287641-Stock'
import { Stock1796213288773 as PostgresStock1796213288773 } from '../migrations/postgres/1796213288773-Stock'
import { MailOutbox1796212721111 } from '../migrations/1796212721111-MailOutbox'
import { MailOutbox1796212722016 as PostgresMailOutbox1796212722016 } from '../migrations/postgres/1796212722016-MailOutbox'
import { FieldReports1796211781089 } from '../migrations/1796211781089-FieldReports'
import { FieldReports1796211781982 as PostgresFieldReports1796211781982 } from '../migrations/postgres/1796211781982-FieldReports'
import { CatalogueChangeFeed1796197600000 } from '../migrations/postgres/1796197600000-CatalogueChangeFeed'
import { Foundation1796197547678 as PostgresFoundation1796197547678 } from '../migrations/postgres/1796197547678-Foundation'
import { CsvImport1796154117731 } from '../migrations/1796154117731-CsvImport'
import { FitmentGraph1796151639561 } from '../migrations/1796151639561-FitmentGraph'
import { Foundation1796150879975 } from '../migrations/1796150879975-Foundation'
import { PartWords1796197875848 } from '../migrations/1796197875848-PartWords'
import { SignInThrottle1796213596647 } from '../migrations/1796213596647-SignInThrottle'
import { SignInThrottle1796213598364 as PostgresSignInThrottle1796213598364 } from '../migrations/postgres/1796213598364-SignInThrottle'
import { SecurityEvents1796213775454 } from '../migrations/1796213775454-SecurityEvents'
import { SecurityEvents1796213777137 as PostgresSecurityEvents1796213777137 } from '../migrations/postgres/1796213777137-SecurityEvents'
import { SessionsByUser1796212625077 } from '../migrations/1796212625077-SessionsByUser'
import { SessionsByUser1796212625998 as PostgresSessionsByUser1796212625998 } from '../migrations/postgres/1796212625998-SessionsByUser'
import { BuildSheetChecklist1796214415051 } from '../migrations/1796214415051-BuildSheetChecklist'
import { BuildSheetChecklist1796214105800 as PostgresBuildSheetChecklist1796214105800 } from '../migrations/postgres/1796214105800-BuildSheetChecklist'

/** SQLite's, in the order they run. */
export const migrations = [
  Foundation1796150879975,
  FitmentGraph1796151639561,
  CsvImport1796154117731,
  PartWords1796197875848,
  FieldReports1796211781089,
  SessionsByUser1796212625077,
  MailOutbox1796212721111,
  Stock1796213287641,
  SignInThrottle1796213596647,
  SecurityEvents1796213775454,
  Vehicles1796213931900,
  BuildSheetChecklist1796214415051,
  Quotes1796215187917,
  AccountTokens1796223315452,
  ImportVehiclesStock1796223370557,
  PartListPrice1796226633835,
  SharedLinks1796227511872,
  StockPhotos1796229010828,
  CounterFinish1796235249342,
  FaceFinish1796279666605,
  WordPartIndex1796291212029,
]

/** PostgreSQL's, generated from the same entities (`npx tsx server/db/generate-migration.ts Name --postgres`). */
export const postgresMigrations = [
  PostgresFoundation1796197547678,
  CatalogueChangeFeed1796197600000,
  PostgresFieldReports1796211781982,
  PostgresSessionsByUser1796212625998,
  PostgresMailOutbox1796212722016,
  PostgresStock1796213288773,
  PostgresSignInThrottle1796213598364,
  PostgresSecurityEvents1796213777137,
  PostgresVehicles1796213933784,
  PostgresBuildSheetChecklist1796214105800,
  PostgresQuotes1796215189078,
  PostgresAccountTokens1796223318439,
  PostgresImportVehiclesStock1796223379484,
  PostgresPartListPrice1796226637373,
  PostgresSharedLinks1796227515397,
  PostgresStockPhotos1796229013832,
  PostgresCounterFinish1796235252157,
  PostgresFaceFinish1796279676351,
  PostgresWordPartIndex1796291213360,
  StockChangeFeed1796300000000,
]
