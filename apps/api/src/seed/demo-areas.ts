// Invented demo areas, drawn in feet (x east, y north) for the demo jobs by title, with the
// starter price book's turf product named by key. Each is planned by the same code a request
// uses, so the demo's saved plans are real plans.
import type { CreateAreaInput } from '@seamwright/shared';

export interface DemoArea {
  jobTitle: string;
  turfKey: string;
  body: Omit<CreateAreaInput, 'turfProductId'>;
}

export const demoAreas: DemoArea[] = [
  {
    // An L-shaped back yard with a planter and a path from the patio to the side gate.
    jobTitle: 'Back yard lawn and path',
    turfKey: 'turf-landscape-175',
    body: {
      name: 'Back yard',
      usage: 'landscape',
      area: {
        outer: [
          [0, 0],
          [42, 0],
          [42, 16],
          [26, 16],
          [26, 30],
          [0, 30],
        ],
        holes: [
          [
            [6, 5],
            [10, 5],
            [10, 9],
            [6, 9],
          ],
        ],
      },
      edges: ['fence', 'fence', 'bed', 'lawn', 'house', 'fence'],
      trafficPaths: [
        {
          points: [
            [13, 30],
            [40, 2],
          ],
          widthFt: 3,
        },
      ],
      roll: { widthFt: 15 },
      baseDepthIn: 3,
      grain: { facing: 'S', toward: 'house', toleranceDeg: 20 },
    },
  },
  {
    jobTitle: 'Front lawn on the slope',
    turfKey: 'turf-landscape-175',
    body: {
      name: 'Front lawn',
      usage: 'landscape',
      area: {
        outer: [
          [0, 0],
          [34, 0],
          [34, 19],
          [0, 19],
        ],
        holes: [],
      },
      edges: ['hard', 'bed', 'house', 'bed'],
      roll: { widthFt: 15 },
      baseDepthIn: 3,
      grain: 'cheapest',
    },
  },
  {
    jobTitle: 'Dog run with pet infill',
    turfKey: 'turf-pet-125',
    body: {
      name: 'Dog run',
      usage: 'pet',
      area: {
        outer: [
          [0, 0],
          [28, 0],
          [28, 13],
          [0, 13],
        ],
        holes: [],
      },
      edges: ['fence', 'fence', 'house', 'fence'],
      roll: { widthFt: 15 },
      baseDepthIn: 4,
      grain: { angleDeg: 0 },
    },
  },
  {
    jobTitle: 'Play yard with fall padding',
    turfKey: 'turf-landscape-175',
    body: {
      name: 'Play yard',
      usage: 'play',
      area: {
        outer: [
          [0, 0],
          [36, 0],
          [36, 27],
          [0, 27],
        ],
        holes: [],
      },
      edges: ['fence', 'fence', 'hard', 'fence'],
      roll: { widthFt: 12 },
      baseDepthIn: 3,
      grain: 'cheapest',
    },
  },
  {
    jobTitle: 'Front courtyard lawn',
    turfKey: 'turf-landscape-175',
    body: {
      name: 'Courtyard',
      usage: 'landscape',
      area: {
        outer: [
          [0, 0],
          [22, 0],
          [22, 16],
          [0, 16],
        ],
        holes: [],
      },
      edges: ['hard', 'bed', 'house', 'bed'],
      roll: { widthFt: 12 },
      baseDepthIn: 3,
      grain: { facing: 'N', toward: 'house' },
    },
  },
];
