import { describe, expect, it } from 'vitest';
import { runCommand, type CommandResult } from './run-command.test-helper.js';
import { MAX_HOLES, MIN_LENGTH_STEP_FT } from '../layout/limits.js';
import { contractExampleRequest, irregularYard } from '../layout/sample-yards.js';

function run(input: string): CommandResult {
  return runCommand('plan-layout', input);
}

describe('plan-layout command', () => {
  it('reads a request on stdin and prints the plan on stdout', () => {
    const request = contractExampleRequest();
    const { status, stdout, stderr } = run(JSON.stringify(request));
    expect(status).toBe(0);
    expect(stderr).toBe('');
    const plan = JSON.parse(stdout) as { orderedSqFt: number; seams: unknown };
    expect(plan.orderedSqFt).toBe(600);
    expect(plan.seams).toEqual({ count: 1, sideFt: 20, buttFt: 0 });
  });

  it('exits non-zero with one stderr line on invalid JSON', () => {
    const { status, stdout, stderr } = run('{ "area": ');
    expect(status).toBe(1);
    expect(stdout).toBe('');
    expect(stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(stderr).toMatch(/^invalid JSON/);
  });

  it('exits non-zero with one stderr line on bad geometry', () => {
    const { status, stderr } = run(
      JSON.stringify({
        area: {
          outer: [
            [0, 0],
            [6, 8],
            [6, 0],
            [0, 8],
          ],
        },
        roll: { widthFt: 15 },
      }),
    );
    expect(status).toBe(1);
    expect(stderr).toBe('area.outer: ring self-intersects at (3, 4)\n');
  });

  // Each case starts a tsx process (1–2 s on a busy machine), hence one case per test.
  const spawnTimeoutMs = 20_000;
  const request = contractExampleRequest();

  it(
    'refuses the 12,900-point incident request with the same message as the API',
    () => {
      const oversize = {
        ...request,
        area: {
          outer: irregularYard(4900, 1, 180, 200),
          holes: Array.from({ length: 40 }, () => irregularYard(200, 2, 1, 2)),
        },
        lengthStepFt: 0.01,
      };
      const { status, stdout, stderr } = run(JSON.stringify(oversize));
      expect(status).toBe(1);
      expect(stdout).toBe('');
      expect(stderr).toBe(
        'area must have at most 5000 points across the outer ring and holes (it has 12900)\n',
      );
    },
    spawnTimeoutMs,
  );

  it(
    'names the holes limit',
    () => {
      const tooMany = run(
        JSON.stringify({
          ...request,
          area: { ...request.area, holes: Array.from({ length: MAX_HOLES + 1 }, () => []) },
        }),
      );
      expect(tooMany.status).toBe(1);
      expect(tooMany.stderr).toBe(`area.holes must have at most ${MAX_HOLES} holes (it has 51)\n`);
    },
    spawnTimeoutMs,
  );

  it(
    'names the length-step limit',
    () => {
      const fineStep = run(JSON.stringify({ ...request, lengthStepFt: MIN_LENGTH_STEP_FT / 2 }));
      expect(fineStep.status).toBe(1);
      expect(fineStep.stderr).toBe('lengthStepFt must be at least 1 in (1/12 ft)\n');
    },
    spawnTimeoutMs,
  );
});
