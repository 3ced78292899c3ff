import { describe, expect, it } from 'vitest';
import { runCommand, type CommandResult } from './run-command.test-helper.js';
import { jobContractExampleRequest } from '../job/sample-jobs.js';

function run(input: string): CommandResult {
  return runCommand('plan-job', input);
}

/** The job of the job contract: front lawn 20 × 10 and side strip 20 × 5, two roll widths, costs. */
function issueJob(): Record<string, unknown> {
  return jobContractExampleRequest();
}

// Each case starts Node with tsx (a few seconds on a busy machine).
describe('plan-job command', { timeout: 30_000 }, () => {
  it('reads a job on stdin and prints the job plan on stdout', () => {
    const { status, stdout, stderr } = run(JSON.stringify(issueJob()));
    expect(stderr).toBe('');
    expect(status).toBe(0);
    // Computed by hand: both cuts side by side in one 15 × 20 piece, 300 sq ft × 300¢.
    const plan = JSON.parse(stdout) as { orderedSqFt: number; pieces: unknown; cost: unknown };
    expect(plan.orderedSqFt).toBe(300);
    expect(plan.pieces).toEqual([{ widthFt: 15, lengthFt: 20, source: 'new' }]);
    expect(plan.cost).toEqual({ turfCents: 90000, seamCents: 0, totalCents: 90000 });
  });

  it('uses a remnant and orders nothing', () => {
    const job = { ...issueJob(), remnants: [{ id: 'R-7', widthFt: 15, lengthFt: 20 }] };
    const { status, stdout } = run(JSON.stringify(job));
    expect(status).toBe(0);
    const plan = JSON.parse(stdout) as { orderedSqFt: number; pieces: unknown };
    expect(plan.orderedSqFt).toBe(0);
    expect(plan.pieces).toEqual([
      { widthFt: 15, lengthFt: 20, source: 'remnant', remnantId: 'R-7' },
    ]);
  });

  it('exits non-zero with one stderr line on invalid JSON', () => {
    const { status, stdout, stderr } = run('{ "areas": ');
    expect(status).toBe(1);
    expect(stdout).toBe('');
    expect(stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(stderr).toMatch(/^invalid JSON/);
  });

  it('exits non-zero with one stderr line naming the field', () => {
    const job = issueJob();
    (job.rolls as Record<string, unknown>[])[1] = { widthFt: 'twelve' };
    const { status, stdout, stderr } = run(JSON.stringify(job));
    expect(status).toBe(1);
    expect(stdout).toBe('');
    expect(stderr).toBe('rolls[1].widthFt must be a positive number\n');
  });

  it('names the area of bad geometry', () => {
    const job = issueJob();
    (job.areas as Record<string, unknown>[])[1] = {
      id: 'side',
      area: {
        outer: [
          [0, 0],
          [6, 8],
          [6, 0],
          [0, 8],
        ],
      },
    };
    const { status, stderr } = run(JSON.stringify(job));
    expect(status).toBe(1);
    expect(stderr).toBe('areas[1].area.outer: ring self-intersects at (3, 4)\n');
  });
});
