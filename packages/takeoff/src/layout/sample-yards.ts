import * as polygonClippingModule from 'polygon-clipping';
import type { Point } from '../geometry/types.js';

const polygonClipping =
  (polygonClippingModule as unknown as { default?: typeof polygonClippingModule }).default ??
  polygonClippingModule;

/** A named sample yard (feet) for demos, tests and the benchmark. */
export interface SampleYard {
  readonly name: string;
  readonly outer: Point[];
  readonly holes: Point[][];
}

/** Small deterministic pseudo-random generator (mulberry32), so samples never change. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function circle(cx: number, cy: number, radius: number, sides: number): [number, number][] {
  return Array.from({ length: sides }, (_, i): [number, number] => {
    const t = (2 * Math.PI * i) / sides;
    return [cx + radius * Math.cos(t), cy + radius * Math.sin(t)];
  });
}

/**
 * A bean about 27 ft long, 18 ft at its widest and about 13.5 ft at its waist: a big lobe
 * (18 ft across) and a smaller one (15 ft) joined, lying east–west.
 */
export function beanYard(): Point[] {
  const [merged] = polygonClipping.union([circle(9, 9, 9, 72)], [circle(19.5, 7.5, 7.5, 60)]);
  const ring = (merged?.[0] ?? []).slice(0, -1);
  return ring.map(([x, y]): Point => [Math.round(x * 1e6) / 1e6, Math.round(y * 1e6) / 1e6]);
}

/** A star-shaped irregular yard with `sides` vertices around (cx, cy), radius between lo and hi. */
export function irregularYard(sides: number, seed: number, lo = 18, hi = 30): Point[] {
  const random = seededRandom(seed);
  let radius = (lo + hi) / 2;
  return Array.from({ length: sides }, (_, i): Point => {
    radius = Math.min(hi, Math.max(lo, radius + (random() - 0.5) * (hi - lo) * 0.35));
    const t = (2 * Math.PI * i) / sides;
    return [
      Math.round((40 + radius * Math.cos(t)) * 1000) / 1000,
      Math.round((35 + radius * 0.8 * Math.sin(t)) * 1000) / 1000,
    ];
  });
}

/** The fixed sample set used by the benchmark and the tests. */
export function sampleYards(): SampleYard[] {
  return [
    {
      name: 'rectangle 30 × 20',
      outer: [
        [0, 0],
        [30, 0],
        [30, 20],
        [0, 20],
      ],
      holes: [],
    },
    {
      name: 'L 40 × 30',
      outer: [
        [0, 0],
        [40, 0],
        [40, 15],
        [20, 15],
        [20, 30],
        [0, 30],
      ],
      holes: [],
    },
    { name: 'bean 27 × 18', outer: beanYard(), holes: [] },
    { name: 'circle-ish 64-gon r 20', outer: circle(0, 0, 20, 64), holes: [] },
    {
      name: 'U 45 × 40 (two arms)',
      outer: [
        [0, 0],
        [45, 0],
        [45, 40],
        [33, 40],
        [33, 12],
        [12, 12],
        [12, 40],
        [0, 40],
      ],
      holes: [],
    },
    {
      name: 'yard 40 × 30 with planter',
      outer: [
        [0, 0],
        [40, 0],
        [40, 30],
        [0, 30],
      ],
      holes: [
        [
          [14, 10],
          [24, 10],
          [24, 17],
          [14, 17],
        ],
      ],
    },
    { name: 'irregular 60-vertex', outer: irregularYard(60, 60), holes: [] },
    { name: 'irregular 400-vertex', outer: irregularYard(400, 400, 30, 48), holes: [] },
  ];
}

/**
 * The request of the planner contract's worked example (DOMAIN.md): a 30 × 20 ft yard, 15 ft
 * roll, grain at 90°. A fresh object each call, so callers may change their copy.
 */
export function contractExampleRequest() {
  return {
    area: {
      outer: [
        [0, 0],
        [30, 0],
        [30, 20],
        [0, 20],
      ] as [number, number][],
      holes: [] as [number, number][][],
    },
    roll: { widthFt: 15, maxLengthFt: 100 },
    grain: { angleDeg: 90 },
    lengthStepFt: 1,
  };
}
