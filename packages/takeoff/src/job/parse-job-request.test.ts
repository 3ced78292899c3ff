import { describe, expect, it } from 'vitest';
import { LayoutInputError } from '../layout/errors.js';
import { MAX_JOB_AREAS } from './job-limits.js';
import { parseJobRequest } from './parse-job-request.js';

type Json = Record<string, unknown>;

const square = {
  outer: [
    [0, 0],
    [10, 0],
    [10, 10],
    [0, 10],
  ],
};

function job(overrides: Json = {}): Json {
  return { areas: [{ id: 'a', area: square }], rolls: [{ widthFt: 15 }], ...overrides };
}

function errorOf(json: unknown): LayoutInputError {
  try {
    parseJobRequest(json);
  } catch (error) {
    if (error instanceof LayoutInputError) return error;
    throw error;
  }
  throw new Error('expected a LayoutInputError');
}

describe('parseJobRequest', () => {
  it('fills in the defaults', () => {
    const request = parseJobRequest(job());
    expect(request.lengthStepFt).toBe(1);
    expect(request.remnants).toEqual([]);
    expect(request.costs).toBeUndefined();
    expect(request.rolls).toEqual([{ widthFt: 15, maxLengthFt: 100 }]);
    expect(request.areas[0]?.grain).toEqual({ kind: 'free' });
    expect(request.areas[0]?.request.trimAllowanceFt).toBe(0);
  });

  it('reads a fixed grain and a facing (default tolerance 0)', () => {
    const request = parseJobRequest(
      job({
        areas: [
          { id: 'a', area: square, grain: { angleDeg: 30 } },
          { id: 'b', area: square, grain: { facing: 'SW' } },
          { id: 'c', area: square, grain: { facing: 'N', toleranceDeg: 15 } },
        ],
      }),
    );
    expect(request.areas.map((area) => area.grain)).toEqual([
      { kind: 'angle', angleDeg: 30 },
      { kind: 'facing', facing: 'SW', centreDeg: 225, toleranceDeg: 0 },
      { kind: 'facing', facing: 'N', centreDeg: 90, toleranceDeg: 15 },
    ]);
  });

  it('fills in remnant ids, area ids and cost rates left out', () => {
    const request = parseJobRequest(
      job({
        areas: [{ area: square }, { area: square }],
        remnants: [{ widthFt: 12, lengthFt: 9 }],
        costs: { turfCentsPerSqFt: 250 },
      }),
    );
    expect(request.areas.map((area) => area.id)).toEqual(['area-1', 'area-2']);
    expect(request.remnants).toEqual([{ id: 'remnant-1', widthFt: 12, lengthFt: 9 }]);
    expect(request.costs).toEqual({
      turfCentsPerSqFt: 250,
      sideSeamCentsPerFt: 0,
      buttSeamCentsPerFt: 0,
    });
  });

  it.each([
    [null, 'request', 'request is missing'],
    [{ rolls: [{ widthFt: 15 }] }, 'areas', 'areas is missing'],
    [job({ areas: [] }), 'areas', 'areas needs at least one area'],
    [job({ rolls: undefined }), 'rolls', 'rolls is missing'],
    [job({ rolls: [] }), 'rolls', 'rolls needs at least one roll'],
    [
      job({ rolls: [{ widthFt: 0 }] }),
      'rolls[0].widthFt',
      'rolls[0].widthFt must be a positive number',
    ],
    [
      job({ rolls: [{ widthFt: 15 }, { widthFt: 15 }] }),
      'rolls[1].widthFt',
      'rolls[1].widthFt: repeats the width of an earlier roll',
    ],
    [
      job({ rolls: [{ widthFt: 15, maxLengthFt: 0.5 }] }),
      'rolls[0].maxLengthFt',
      'rolls[0].maxLengthFt must be at least lengthStepFt',
    ],
    [job({ lengthStepFt: -1 }), 'lengthStepFt', 'lengthStepFt must be a positive number'],
    [
      job({ remnants: [{ id: 'R', widthFt: 12 }] }),
      'remnants[0].lengthFt',
      'remnants[0].lengthFt is missing',
    ],
    [
      job({
        remnants: [
          { id: 'R', widthFt: 1, lengthFt: 1 },
          { id: 'R', widthFt: 1, lengthFt: 1 },
        ],
      }),
      'remnants[1].id',
      'remnants[1].id: repeats the id "R"',
    ],
    [
      job({ costs: { turfCentsPerSqFt: -3 } }),
      'costs.turfCentsPerSqFt',
      'costs.turfCentsPerSqFt must be a number ≥ 0',
    ],
    [job({ costs: 5 }), 'costs', 'costs must be an object'],
    [job({ areas: [{ id: 'a' }] }), 'areas[0].area', 'areas[0].area is missing'],
    [
      job({
        areas: [
          { id: 'a', area: square },
          { id: 'a', area: square },
        ],
      }),
      'areas[1].id',
      'areas[1].id: repeats the id "a"',
    ],
    [
      job({ areas: [{ id: '', area: square }] }),
      'areas[0].id',
      'areas[0].id must be a non-empty string',
    ],
    [
      job({
        areas: [
          {
            area: {
              outer: [
                [0, 0],
                [1, 0],
              ],
            },
          },
        ],
      }),
      'areas[0].area.outer',
      'areas[0].area.outer needs at least 3 points',
    ],
    [
      job({
        areas: [
          {
            area: {
              outer: [
                [0, 0],
                [6, 8],
                [6, 0],
                [0, 8],
              ],
            },
          },
        ],
      }),
      'areas[0].area.outer',
      'areas[0].area.outer: ring self-intersects at (3, 4)',
    ],
    [
      job({ areas: [{ area: square, trafficPaths: [[[0, 0]]] }] }),
      'areas[0].trafficPaths[0]',
      'areas[0].trafficPaths[0] needs at least 2 points',
    ],
    [
      job({ areas: [{ area: square, edges: ['hard'] }] }),
      'areas[0].edges',
      'areas[0].edges must have one tag per edge (4)',
    ],
    [
      job({ areas: [{ area: square, grain: { facing: 'UP' } }] }),
      'areas[0].grain.facing',
      'areas[0].grain.facing must be one of E, NE, N, NW, W, SW, S, SE',
    ],
    [
      job({ areas: [{ area: square, grain: { facing: 'N', angleDeg: 90 } }] }),
      'areas[0].grain',
      'areas[0].grain: gives both angleDeg and facing; give one',
    ],
    [
      job({ areas: [{ area: square, grain: {} }] }),
      'areas[0].grain',
      'areas[0].grain needs angleDeg or facing',
    ],
    [
      job({ areas: [{ area: square, grain: { facing: 'N', toleranceDeg: 181 } }] }),
      'areas[0].grain.toleranceDeg',
      'areas[0].grain.toleranceDeg must be at most 180',
    ],
    [
      job({ areas: [{ area: square, grain: { angleDeg: 'north' } }] }),
      'areas[0].grain.angleDeg',
      'areas[0].grain.angleDeg must be a finite number',
    ],
    [
      job({ areas: Array.from({ length: MAX_JOB_AREAS + 1 }, () => ({ area: square })) }),
      'areas',
      `areas must have at most ${MAX_JOB_AREAS} areas`,
    ],
  ])('rejects bad input naming the field (%#)', (json, path, message) => {
    const error = errorOf(json);
    expect(error.path).toBe(path);
    expect(error.message).toBe(message);
    expect(error.message).not.toContain('\n');
  });

  it('checks the strip limit with the narrowest roll and names it', () => {
    const huge = {
      outer: [
        [0, 0],
        [100000, 0],
        [100000, 10],
        [0, 10],
      ],
    };
    const error = errorOf(
      job({ areas: [{ area: huge }], rolls: [{ widthFt: 15 }, { widthFt: 1 }] }),
    );
    expect(error.path).toBe('rolls[1].widthFt');
  });
});
