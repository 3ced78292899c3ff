// The document pool: a warm render stays well inside the time budget, a render past the
// budget is stopped, and a full queue is refused at once (503) instead of piling up.
import { afterAll, describe, expect, it } from 'vitest';
import { DocumentPool, sampleEstimateDocumentInput } from '@seamwright/api';
import { performance } from 'node:perf_hooks';

const pools: DocumentPool[] = [];
function poolWith(config: ConstructorParameters<typeof DocumentPool>[0]): DocumentPool {
  const pool = new DocumentPool(config);
  pools.push(pool);
  return pool;
}
afterAll(async () => {
  await Promise.all(pools.map((pool) => pool.close()));
});

describe('the document pool', () => {
  it('renders a document with plans in less than its time budget', async () => {
    const pool = poolWith(undefined);
    const input = sampleEstimateDocumentInput({ cancellation: true });
    await pool.render(input); // starts the thread (tsx, pdfkit and the fonts load once)
    const started = performance.now();
    const pdf = await pool.render(input);
    const ms = performance.now() - started;
    expect(pdf.length).toBeGreaterThan(10_000);
    expect(ms).toBeLessThan(pool.config.budgetMs);
  });

  it('stops a document that runs past the budget', async () => {
    // Rendering the sample takes tens of milliseconds at least; 1 ms is always exceeded.
    const pool = poolWith({ threads: 1, budgetMs: 1, maxQueue: 0 });
    await expect(pool.render(sampleEstimateDocumentInput())).rejects.toMatchObject({
      code: 'INTERNAL',
      message: expect.stringContaining('took longer than') as unknown,
    });
  });

  it('refuses a document when every thread and queue place is taken', async () => {
    const pool = poolWith({ threads: 1, budgetMs: 10_000, maxQueue: 0 });
    const input = sampleEstimateDocumentInput({ areas: false });
    const first = pool.render(input);
    await expect(pool.render(input)).rejects.toMatchObject({
      code: 'SERVICE_BUSY',
      headers: { 'Retry-After': '10' },
    });
    await expect(first).resolves.toBeInstanceOf(Buffer);
  });
});
