import { describe, expect, it } from 'vitest';
import { LayoutInputError } from './errors.js';
import {
  MAX_HOLES,
  MAX_PIECES_PER_STRIP,
  MAX_RING_POINTS,
  MAX_TOTAL_VERTICES,
  MAX_TRAFFIC_PATH_POINTS,
  MAX_TRAFFIC_PATHS,
  MIN_LENGTH_STEP_FT,
  checkLayoutRequestSize,
} from './limits.js';
import { parseLayoutRequest } from './parse-request.js';
import { contractExampleRequest, irregularYard } from './sample-yards.js';

const valid = contractExampleRequest();

function messageOf(json: unknown): string {
  try {
    parseLayoutRequest(json);
  } catch (error) {
    expect(error).toBeInstanceOf(LayoutInputError);
    return (error as LayoutInputError).message;
  }
  throw new Error('expected a LayoutInputError');
}

describe('parseLayoutRequest', () => {
  it('accepts the contract example and fills defaults', () => {
    const request = parseLayoutRequest(valid);
    expect(request).toMatchObject({
      lengthStepFt: 1,
      trimAllowanceFt: 0,
      trafficPaths: [],
      grain: { angleDeg: 90 },
    });
    expect(parseLayoutRequest({ ...valid, grain: undefined, roll: { widthFt: 12 } }).roll).toEqual({
      widthFt: 12,
      maxLengthFt: 100,
    });
  });

  it('drops a repeated closing point', () => {
    const request = parseLayoutRequest({
      ...valid,
      area: {
        outer: [
          [0, 0],
          [30, 0],
          [30, 20],
          [0, 20],
          [0, 0],
        ],
      },
    });
    expect(request.area.outer).toHaveLength(4);
  });

  it('accepts traffic paths as plain polylines or with a width', () => {
    const request = parseLayoutRequest({
      ...valid,
      trafficPaths: [
        [
          [0, 10],
          [30, 10],
        ],
        {
          points: [
            [5, 0],
            [5, 20],
          ],
          widthFt: 4,
        },
      ],
    });
    expect(request.trafficPaths.map((path) => path.widthFt)).toEqual([3, 4]);
  });

  const cases: [string, unknown, string][] = [
    ['not an object', 'hello', 'request must be an object'],
    ['missing area', { roll: valid.roll }, 'area is missing'],
    ['missing roll', { area: valid.area }, 'roll is missing'],
    ['missing width', { ...valid, roll: { maxLengthFt: 100 } }, 'roll.widthFt is missing'],
    ['zero width', { ...valid, roll: { widthFt: 0 } }, 'roll.widthFt must be a positive number'],
    [
      'string width',
      { ...valid, roll: { widthFt: '15' } },
      'roll.widthFt must be a positive number',
    ],
    [
      'NaN width',
      { ...valid, roll: { widthFt: Number.NaN } },
      'roll.widthFt must be a positive number',
    ],
    [
      'Infinity step',
      { ...valid, lengthStepFt: Infinity },
      'lengthStepFt must be a positive number',
    ],
    [
      'max below step',
      { ...valid, roll: { widthFt: 15, maxLengthFt: 0.5 } },
      'roll.maxLengthFt must be at least lengthStepFt',
    ],
    ['negative trim', { ...valid, trimAllowanceFt: -1 }, 'trimAllowanceFt must be a number ≥ 0'],
    [
      'grain not numeric',
      { ...valid, grain: { angleDeg: 'north' } },
      'grain.angleDeg must be a finite number',
    ],
    [
      'two points',
      {
        ...valid,
        area: {
          outer: [
            [0, 0],
            [1, 1],
          ],
        },
      },
      'area.outer needs at least 3 points',
    ],
    [
      'non-numeric point',
      {
        ...valid,
        area: {
          outer: [
            [0, 0],
            [1, 'a'],
            [1, 1],
          ],
        },
      },
      'area.outer[1][1] must be a finite number',
    ],
    [
      'point not a pair',
      { ...valid, area: { outer: [[0, 0], [1], [1, 1]] } },
      'area.outer[1] must be a pair [x, y] of numbers',
    ],
    [
      'collinear points',
      {
        ...valid,
        area: {
          outer: [
            [0, 0],
            [1, 1],
            [2, 2],
          ],
        },
      },
      'area.outer: ring self-intersects at (0, 0)',
    ],
    [
      'bow tie',
      {
        ...valid,
        area: {
          outer: [
            [0, 0],
            [6, 8],
            [6, 0],
            [0, 8],
          ],
        },
      },
      'area.outer: ring self-intersects at (3, 4)',
    ],
    [
      'hole outside',
      {
        ...valid,
        area: {
          outer: valid.area.outer,
          holes: [
            [
              [40, 0],
              [45, 0],
              [45, 5],
            ],
          ],
        },
      },
      'area.holes[0]: hole lies outside the outer ring',
    ],
    [
      'hole crossing the outer ring',
      {
        ...valid,
        area: {
          outer: valid.area.outer,
          holes: [
            [
              [25, 5],
              [35, 5],
              [35, 10],
              [25, 10],
            ],
          ],
        },
      },
      'area.holes[0]: hole touches or crosses the outer ring at (30, 5)',
    ],
    [
      'overlapping holes',
      {
        ...valid,
        area: {
          outer: valid.area.outer,
          holes: [
            [
              [2, 2],
              [8, 2],
              [8, 8],
              [2, 8],
            ],
            [
              [3, 3],
              [5, 3],
              [5, 5],
            ],
          ],
        },
      },
      'area.holes[1]: hole overlaps area.holes[0] at (3, 3)',
    ],
    [
      'edge tags of wrong length',
      { ...valid, edges: ['hard'] },
      'edges must have one tag per edge (4)',
    ],
    [
      'unknown edge tag',
      { ...valid, edges: ['hard', 'moat', null, null] },
      'edges[1] must be one of hard, bed, lawn, fence, house or null',
    ],
    [
      'path with one point',
      { ...valid, trafficPaths: [[[1, 1]]] },
      'trafficPaths[0] needs at least 2 points',
    ],
  ];
  for (const [name, json, message] of cases) {
    it(`rejects ${name}`, () => {
      expect(messageOf(json)).toBe(message);
    });
  }

  it('names the field in the error path', () => {
    try {
      parseLayoutRequest({ ...valid, roll: { widthFt: -2 } });
    } catch (error) {
      expect((error as LayoutInputError).path).toBe('roll.widthFt');
    }
    expect.assertions(1);
  });

  describe('limits on the work a request may ask for', () => {
    /** A small square hole at column i of a grid inside a large outer ring. */
    const squareHole = (i: number): [number, number][] => {
      const x = 10 + (i % 20) * 3;
      const y = 10 + Math.floor(i / 20) * 3;
      return [
        [x, y],
        [x + 1, y],
        [x + 1, y + 1],
        [x, y + 1],
      ];
    };
    const bigSquare: [number, number][] = [
      [0, 0],
      [100, 0],
      [100, 100],
      [0, 100],
    ];
    const line = (count: number): [number, number][] =>
      Array.from({ length: count }, (_, i): [number, number] => [1 + i * 0.01, 5]);

    const limitCases: [string, unknown, string][] = [
      [
        'an outer ring past MAX_RING_POINTS',
        { ...valid, area: { outer: irregularYard(MAX_RING_POINTS + 1, 1) } },
        `area.outer must have at most ${MAX_RING_POINTS} points (it has ${MAX_RING_POINTS + 1})`,
      ],
      [
        'more holes than MAX_HOLES',
        {
          ...valid,
          area: {
            outer: bigSquare,
            holes: Array.from({ length: MAX_HOLES + 1 }, (_, i) => squareHole(i)),
          },
        },
        `area.holes must have at most ${MAX_HOLES} holes (it has ${MAX_HOLES + 1})`,
      ],
      [
        'more points than MAX_TOTAL_VERTICES across the rings',
        {
          ...valid,
          area: {
            outer: irregularYard(4900, 1, 180, 200),
            holes: Array.from({ length: 40 }, () => irregularYard(200, 2, 1, 2)),
          },
        },
        `area must have at most ${MAX_TOTAL_VERTICES} points across the outer ring and holes (it has 12900)`,
      ],
      [
        'more traffic paths than MAX_TRAFFIC_PATHS',
        { ...valid, trafficPaths: Array.from({ length: MAX_TRAFFIC_PATHS + 1 }, () => line(2)) },
        `trafficPaths must have at most ${MAX_TRAFFIC_PATHS} paths (it has ${MAX_TRAFFIC_PATHS + 1})`,
      ],
      [
        'a traffic path past MAX_TRAFFIC_PATH_POINTS',
        { ...valid, trafficPaths: [{ points: line(MAX_TRAFFIC_PATH_POINTS + 1) }] },
        `trafficPaths[0].points must have at most ${MAX_TRAFFIC_PATH_POINTS} points (it has ${MAX_TRAFFIC_PATH_POINTS + 1})`,
      ],
      [
        'a length step below MIN_LENGTH_STEP_FT',
        { ...valid, lengthStepFt: 0.01 },
        'lengthStepFt must be at least 1 in (1/12 ft)',
      ],
      [
        'a longest piece needing more than MAX_PIECES_PER_STRIP pieces per strip',
        { ...valid, roll: { widthFt: 15, maxLengthFt: 0.25 }, lengthStepFt: 0.25 },
        `roll.maxLengthFt is too short for this area (more than ${MAX_PIECES_PER_STRIP} pieces along one strip)`,
      ],
    ];
    for (const [name, json, message] of limitCases) {
      it(`rejects ${name}, naming the limit`, () => {
        expect(messageOf(json)).toBe(message);
      });
    }

    it('accepts requests right at the limits', () => {
      const atLimits = {
        ...valid,
        area: {
          outer: bigSquare,
          holes: Array.from({ length: MAX_HOLES }, (_, i) => squareHole(i)),
        },
        trafficPaths: Array.from({ length: MAX_TRAFFIC_PATHS }, () =>
          line(MAX_TRAFFIC_PATH_POINTS),
        ),
        lengthStepFt: MIN_LENGTH_STEP_FT,
      };
      expect(parseLayoutRequest(atLimits).area.holes).toHaveLength(MAX_HOLES);
      const closedRing = [...irregularYard(MAX_TOTAL_VERTICES, 1), [0, 0]];
      closedRing[closedRing.length - 1] = closedRing[0] as [number, number];
      expect(() => checkLayoutRequestSize({ ...valid, area: { outer: closedRing } })).not.toThrow();
    });

    it('refuses an oversize request before reading any point', () => {
      // Points that are not even pairs: the size check must answer first, from lengths alone.
      const garbage = Array.from({ length: MAX_TOTAL_VERTICES + 1 }, () => 'x');
      expect(messageOf({ ...valid, area: { outer: garbage } })).toMatch(
        /^area\.outer must have at most/,
      );
    });
  });
});
