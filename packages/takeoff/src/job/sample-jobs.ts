import { irregularYard } from '../layout/sample-yards.js';
import type { Point } from '../geometry/types.js';

/** A named sample job (request JSON, as a caller would send it) for the benchmark and demos. */
export interface SampleJob {
  readonly name: string;
  readonly request: Record<string, unknown>;
}

function shifted(ring: Point[], dx: number): Point[] {
  return ring.map(([x, y]): Point => [Math.round((x + dx) * 1000) / 1000, y]);
}

/** Three irregular 60-vertex yards, 100 ft apart, each about 1,700 sq ft. */
function threeYards(): Record<string, unknown>[] {
  return [60, 61, 62].map((seed, i) => ({
    id: `yard-${i + 1}`,
    area: { outer: shifted(irregularYard(60, seed), 100 * i), holes: [] },
  }));
}

/** The fixed sample jobs used by the benchmark. */
export function sampleJobs(): SampleJob[] {
  const remnants = [
    { id: 'R-1', widthFt: 15, lengthFt: 30 },
    { id: 'R-2', widthFt: 12, lengthFt: 18 },
    { id: 'R-3', widthFt: 15, lengthFt: 9 },
    { id: 'R-4', widthFt: 6, lengthFt: 40 },
    { id: 'R-5', widthFt: 10, lengthFt: 25 },
  ];
  return [
    {
      name: 'three 60-vertex yards, free grain, 15 ft roll',
      request: { areas: threeYards(), rolls: [{ widthFt: 15, maxLengthFt: 100 }] },
    },
    {
      name: 'three 60-vertex yards, free grain, 15 + 12 ft rolls',
      request: { areas: threeYards(), rolls: [{ widthFt: 15 }, { widthFt: 12 }] },
    },
    {
      name: 'three 60-vertex yards, free grain, 15 ft roll, five remnants',
      request: { areas: threeYards(), rolls: [{ widthFt: 15 }], remnants },
    },
    {
      name: 'three 60-vertex yards, facing S ± 20°, 15 + 12 ft rolls, costs, five remnants',
      request: {
        areas: threeYards().map((area) => ({ ...area, grain: { facing: 'S', toleranceDeg: 20 } })),
        rolls: [{ widthFt: 15 }, { widthFt: 12 }],
        remnants,
        costs: { turfCentsPerSqFt: 300, sideSeamCentsPerFt: 150, buttSeamCentsPerFt: 250 },
      },
    },
  ];
}
