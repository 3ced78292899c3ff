import { availableParallelism } from 'node:os';
import { describe, expect, it } from 'vitest';
import { loadEnv } from './env.js';

describe('loadEnv planner settings', () => {
  it('defaults to one thread less than the cores, a 5 s budget and four waiting tasks per thread', () => {
    const threads = Math.max(1, availableParallelism() - 1);
    expect(loadEnv({}).planner).toEqual({ threads, budgetMs: 5000, maxQueue: threads * 4 });
  });

  it('reads PLANNER_THREADS, PLANNER_BUDGET_MS and PLANNER_MAX_QUEUE', () => {
    const env = loadEnv({ PLANNER_THREADS: '3', PLANNER_BUDGET_MS: '750', PLANNER_MAX_QUEUE: '0' });
    expect(env.planner).toEqual({ threads: 3, budgetMs: 750, maxQueue: 0 });
  });

  it('refuses a zero thread count or a budget too small to plan anything', () => {
    expect(() => loadEnv({ PLANNER_THREADS: '0' })).toThrow(/PLANNER_THREADS/);
    expect(() => loadEnv({ PLANNER_BUDGET_MS: '10' })).toThrow(/PLANNER_BUDGET_MS/);
  });
});
