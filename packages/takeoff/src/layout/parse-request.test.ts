import { describe, expect, it } from 'vitest';
import { LayoutInputError } from './errors.js';
import { parseLayoutRequest } from './parse-request.js';
import { contractExampleRequest } from './sample-yards.js';

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
});
