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

  it('tags only the north edge of a 30 ft (east–west) × 20 ft rectangle as bed: 30 ft bed, 70 ft unknown', () => {
    // Check value: the north side runs east–west, so it is the 30 ft width; the other three
    // sides are 20 + 30 + 20 = 70 ft (arithmetic).
    const { request } = buildLayoutRequest(
      params(`len=20'&wid=30'&redges=bed,unknown,unknown,unknown`),
    );
    // The rectangle's ring runs S, E, N, W (shape-builders), so the north edge is edge 2.
    expect(request?.edges).toEqual([null, null, 'bed', null]);
    const plan = planLayout(request ?? { area: { outer: [] }, roll: { widthFt: 15 } });
    expect(plan.perimeterByTagFt).toEqual({ bed: 30, unknown: 70 });
  });

  it('puts each of the L’s named edges at its place in the ring', () => {
    // The sample L: 30 ft N–S × 40 ft E–W, notch 15 × 20 out of the north-east corner. North
    // edge (west part) 20 ft, notch sides 20 ft (north-facing) and 15 ft (east-facing), east
    // edge (south part) 15 ft, south 40 ft, west 30 ft; 140 ft in all (arithmetic).
    const { request } = buildLayoutRequest(
      params(
        `shape=l-shape&len=30&wid=40&nlen=15&nwid=20&ledges=bed,hard,fence,lawn,house,unknown`,
      ),
    );
    expect(request?.edges).toEqual(['house', 'lawn', 'hard', 'fence', 'bed', null]);
    const plan = planLayout(request ?? { area: { outer: [] }, roll: { widthFt: 15 } });
    expect(plan.perimeterByTagFt).toEqual({
      bed: 20,
      hard: 20,
      fence: 15,
      lawn: 15,
      house: 40,
      unknown: 30,
    });
  });

  it('tags every edge of typed points with "All edges meet", after dropping a closing point', () => {
    const { request } = buildLayoutRequest(
      params(`shape=points&pts=${encodeURIComponent('0,0\n10,0\n10,8\n0,8\n0,0')}&pedge=fence`),
    );
    expect(request?.area.outer).toHaveLength(4);
    expect(request?.edges).toEqual(['fence', 'fence', 'fence', 'fence']);
  });

  it('sends no edge tags while every edge is "Not sure"', () => {
    expect(buildLayoutRequest(params('')).request).not.toHaveProperty('edges');
    expect(buildLayoutRequest(params('shape=points')).request).not.toHaveProperty('edges');
  });

  it('adds an edging line to the takeoff once an edge meets a planting bed', () => {
    const untagged = computePlanState(params(`len=20'&wid=30'`), emptyPlanState);
    expect(untagged.good?.takeoff?.lines.map((line) => line.key)).not.toContain('edging');
    const bed = computePlanState(
      params(`len=20'&wid=30'&redges=bed,unknown,unknown,unknown`),
      emptyPlanState,
    );
    const edging = bed.good?.takeoff?.lines.find((line) => line.key === 'edging');
    expect(edging?.label).toBe('Edging / bender board');
    expect(edging?.inputs).toMatchObject({ edgingFt: 30 });
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
