// A saved area as the API answers it, built with the real planner (no API in component tests).
import { planLayout } from '@seamwright/takeoff';
import type { LayoutRequestInput } from '@seamwright/takeoff';
import type { Area, AreaAlternative } from '../api/area-types';

/** An L-shaped yard: 40 × 30 ft less a 15 × 12 ft corner (1,020 sq ft), with a walkway. */
export const lYardRequest = {
  area: {
    outer: [
      [0, 0],
      [40, 0],
      [40, 18],
      [25, 18],
      [25, 30],
      [0, 30],
    ],
    holes: [],
  },
  roll: { widthFt: 15, maxLengthFt: 100 },
  trafficPaths: [
    {
      points: [
        [2, 25],
        [38, 2],
      ],
      widthFt: 3,
    },
  ],
} satisfies LayoutRequestInput;

function alternative(
  kind: AreaAlternative['kind'],
  label: string,
  request: LayoutRequestInput,
): AreaAlternative {
  const plan = planLayout(request);
  return {
    kind,
    label,
    rollWidthFt: request.roll.widthFt,
    grainAngleDeg: plan.grainAngleDeg,
    orderedSqFt: plan.orderedSqFt,
    wastePct: plan.wastePct,
    seamCount: plan.seams.count,
    seamFt: plan.seams.sideFt + plan.seams.buttFt,
    walkwaySeamFt: plan.trafficSeamCrossings.reduce((sum, c) => sum + c.lengthFt, 0),
    sameAsChosen: false,
    plan,
  };
}

export function sampleArea(): Area {
  const chosen = alternative('chosen', 'Saved plan', lYardRequest);
  const other = alternative('other-width', '12 ft roll', {
    ...lYardRequest,
    roll: { widthFt: 12, maxLengthFt: 100 },
  });
  return {
    id: '00000000-0000-4000-8000-00000000a001',
    jobId: '00000000-0000-4000-8000-00000000b001',
    name: 'Back lawn',
    usage: 'play',
    grainChoice: { kind: 'cheapest' },
    turfProductId: null,
    turfProduct: null,
    baseDepthIn: 3,
    areaSqFt: chosen.plan.areaSqFt,
    orderedSqFt: chosen.orderedSqFt,
    wastePct: chosen.wastePct,
    request: lYardRequest,
    plan: { ...chosen.plan, engineVersion: 'test' },
    alternatives: [chosen, other],
    underlay: null,
    createdAt: '2026-12-01T10:00:00.000Z',
    updatedAt: '2026-12-01T10:00:00.000Z',
  };
}
