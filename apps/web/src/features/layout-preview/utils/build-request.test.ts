import { describe, expect, it } from 'vitest';
import { planLayout } from '@seamwright/takeoff';
import { buildLayoutRequest } from './build-request';
import { parseLayoutParams } from './layout-params';
import { computePlanState, emptyPlanState } from './compute-plan';

const params = (query: string) => parseLayoutParams(new URLSearchParams(query));

describe('building the planner request from the screen', () => {
  it('plans 30 × 20 ft, grain east–west, on a 15 ft roll as two 15 × 20 pieces, 600 sq ft', () => {
    // Check value: 30 × 20 ft with a 15 ft roll, grain along the 20 ft side → two 15 × 20 ft
    // pieces, 600 sq ft, one 20 ft seam (arithmetic; TRADE.md row 1).
    const { request, errors } = buildLayoutRequest(
      params(`len=30'&wid=20'&roll=15&grain=east-west`),
    );
    expect(errors).toEqual({});
    expect(request?.grain).toEqual({ angleDeg: 0 });
    const plan = planLayout(request ?? { area: { outer: [] }, roll: { widthFt: 15 } });
    expect(plan.orderedSqFt).toBe(600);
    expect(plan.pieces).toEqual([
      { widthFt: 15, lengthFt: 20 },
      { widthFt: 15, lengthFt: 20 },
    ]);
    expect(plan.seams).toEqual({ count: 1, sideFt: 20, buttFt: 0 });
  });

  it('leaves the grain to the planner for "Choose for me", and reads a typed angle', () => {
    expect(buildLayoutRequest(params('')).request?.grain).toBeNull();
    expect(buildLayoutRequest(params('grain=angle&angle=45°')).request?.grain).toEqual({
      angleDeg: 45,
    });
    expect(buildLayoutRequest(params('grain=angle&angle=steep')).errors.angle).toBe(
      '"steep" is not an angle; type degrees, such as 45',
    );
  });

  it('adds the walkway only when both ends read, and names the missing end', () => {
    expect(buildLayoutRequest(params('from=0,5&to=18,5')).request?.trafficPaths).toEqual([
      [
        [0, 5],
        [18, 5],
      ],
    ]);
    const halfDone = buildLayoutRequest(params('from=0,5'));
    expect(halfDone.request).toBeNull();
    expect(halfDone.errors.to).toBe('Give where the path ends, or clear both ends');
  });

  it('keeps the last good plan and gives the planner’s message for a shape it refuses', () => {
    const good = computePlanState(params(''), emptyPlanState);
    expect(good.good?.plan.orderedSqFt).toBeGreaterThan(0);
    // A bow tie: the outline crosses itself.
    const refused = computePlanState(
      params(`shape=points&pts=${encodeURIComponent('0,0\n10,10\n10,0\n0,10')}`),
      good,
    );
    expect(refused.good).toBe(good.good);
    expect(refused.plannerError).toMatch(/^The outline: ring self-intersects/);
  });
});
