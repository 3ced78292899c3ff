// The yardsticks for the API benchmark, run as their own process by scripts/bench-api.ts:
// `GET /bare` answers `{ data: [] }` from plain Express, and `GET /one-query` runs one MariaDB
// query (the first 25 customers of the benchmark company, by name, through the same index the
// customers list uses) on a pool as large as the API's. No session, no logging, no ORM.
// Usage: node --import tsx scripts/lib/bench-baseline-server.ts (environment set by the bench).
import express from 'express';
import { createPool } from 'mariadb';

function required(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set`);
  return value;
}

const companyId = required('BENCH_COMPANY_ID');
const pool = createPool({
  host: '127.0.0.1',
  port: Number(required('DB_PORT')),
  database: required('DB_NAME'),
  user: required('DB_USER'),
  password: process.env.DB_PASSWORD ?? '',
  connectionLimit: 10,
});

const app = express();
app.disable('x-powered-by');
app.get('/bare', (_req, res) => {
  res.json({ data: [] });
});
app.get('/one-query', async (_req, res) => {
  const rows: unknown[] = await pool.query(
    'SELECT * FROM customers WHERE company_id = ? AND archived_at IS NULL ORDER BY name, id LIMIT 25',
    [companyId],
  );
  res.json({ data: rows });
});

const server = app.listen(Number(required('PORT')), '127.0.0.1');
process.once('SIGTERM', () => {
  server.closeAllConnections();
  server.close(() => void pool.end().then(() => process.exit(0)));
});
