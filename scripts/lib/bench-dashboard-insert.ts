// Multi-row INSERTs for the dashboard benchmark's seed (2,000 rows a statement).
import type { Connection } from 'mariadb';

export const batchRows = 2000;
export const day = 86_400_000;

export async function insert(
  conn: Connection,
  table: string,
  columns: readonly string[],
  rows: readonly unknown[][],
): Promise<void> {
  const tuple = `(${columns.map(() => '?').join(',')})`;
  for (let start = 0; start < rows.length; start += batchRows) {
    const slice = rows.slice(start, start + batchRows);
    await conn.query(
      `INSERT INTO ${table} (${columns.join(',')}) VALUES ${slice.map(() => tuple).join(',')}`,
      slice.flat(),
    );
  }
}

export const isoDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);
