import type { Database } from '../db/database'
import { normalisePartCode } from '../../shared/schemas/part'

/**
 * What an import says of a part number the catalogue lacks, with the
 * catalogue's number that reads the same once normalised ("did you mean"),
 * found through the part-key index and asked once per number, however many
 * rows name it.
 */
export function unknownPartMessages(db: Database): (number: string) => Promise<string> {
  const asked = new Map<string, Promise<string>>()
  return (number) => {
    let message = asked.get(number)
    if (!message) {
      message = db
        .get<{ partNumber: string }>('SELECT "partNumber" FROM part WHERE "partKey" = ? ORDER BY "partNumber" LIMIT 1', [
          normalisePartCode(number),
        ])
        .then(
          (similar) =>
            `No part ${number} in the catalogue${similar ? ` (did you mean ${similar.partNumber}?)` : ''}; import it in a parts file first.`,
        )
      asked.set(number, message)
    }
    return message
  }
}
