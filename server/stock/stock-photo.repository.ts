import { placeholders, type Database } from '../db/database'

export type StockPhotoRow = {
  id: number
  stockItemId: number
  position: number
  displayKey: string
  thumbKey: string
  width: number
  height: number
}
export type NewStockPhoto = Omit<StockPhotoRow, 'id' | 'stockItemId' | 'position'>

const COLUMNS = 'SELECT "id", "stockItemId", "position", "displayKey", "thumbKey", "width", "height" FROM stock_photo'

/** The stock_photo table: a unit's photos by position. */
export class StockPhotoRepository {
  constructor(private readonly db: Database) {}

  of(stockItemId: number): Promise<StockPhotoRow[]> {
    return this.db.all<StockPhotoRow>(`${COLUMNS} WHERE "stockItemId" = ? ORDER BY "position", "id"`, [stockItemId])
  }

  get(stockItemId: number, id: number): Promise<StockPhotoRow | undefined> {
    return this.db.get<StockPhotoRow>(`${COLUMNS} WHERE "id" = ? AND "stockItemId" = ?`, [id, stockItemId])
  }

  /** Adds the photos after the unit's last, in one transaction; answers how many the unit has now. */
  add(stockItemId: number, photos: NewStockPhoto[], most: number): Promise<number> {
    return this.db.transaction(async (tx) => {
      const held = await tx.get<{ count: number; last: number | null }>(
        'SELECT CAST(COUNT(*) AS INTEGER) AS "count", MAX("position") AS "last" FROM stock_photo WHERE "stockItemId" = ?',
        [stockItemId],
      )
      const count = held?.count ?? 0
      if (count + photos.length > most) throw new TooMany(most - count)
      let position = (held?.last ?? -1) + 1
      for (const photo of photos) {
        await tx.insert(
          `INSERT INTO stock_photo ("stockItemId", "position", "displayKey", "thumbKey", "width", "height") VALUES (${placeholders(6)}) RETURNING "id"`,
          [stockItemId, position++, photo.displayKey, photo.thumbKey, photo.width, photo.height],
        )
      }
      return count + photos.length
    })
  }

  async remove(stockItemId: number, id: number): Promise<boolean> {
    return (await this.db.run('DELETE FROM stock_photo WHERE "id" = ? AND "stockItemId" = ?', [id, stockItemId])).changes > 0
  }
}

/** More photos than a unit may hold; `room` is how many more it could take. */
export class TooMany extends Error {
  constructor(readonly room: number) {
    super(`Room for ${room} more photos.`)
  }
}
