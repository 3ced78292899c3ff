import { describe, expect, it } from 'vitest';
import { parseJobRequest } from './parse-job-request.js';
import { planJob } from './plan-job.js';
import {
  cutGrainDirection,
  isGuillotine,
  newSqFt,
  packingProblems,
  turnGap,
} from './job-test-helpers.js';
import type { JobPlan } from './types.js';

type Json = Record<string, unknown>;

function plan(json: Json): JobPlan {
  return planJob(parseJobRequest(json));
}

function rect(x: number, y: number, w: number, h: number): Json {
  return {
    outer: [
      [x, y],
      [x + w, y],
      [x + w, y + h],
      [x, y + h],
    ],
    holes: [],
  };
}

/** The job of the issue: a 20 × 10 front lawn and a 20 × 5 side strip, 15 ft and 12 ft rolls. */
function issueJob(): Json {
  return {
    areas: [
      { id: 'front', area: rect(0, 0, 20, 10), grain: { angleDeg: 0 } },
      { id: 'side', area: rect(30, 0, 20, 5), grain: { facing: 'E', toleranceDeg: 0 } },
    ],
    rolls: [
      { widthFt: 15, maxLengthFt: 100 },
      { widthFt: 12, maxLengthFt: 100 },
    ],
    lengthStepFt: 1,
    costs: { turfCentsPerSqFt: 300, sideSeamCentsPerFt: 150, buttSeamCentsPerFt: 250 },
  };
}

describe('planJob — worked examples', () => {
  it('packs two areas into one piece (the issue example)', () => {
    // Computed by hand: cuts 10 × 20 and 5 × 20 (across × along) sit side by side in one
    // 15 ft wide piece 20 ft long = 300 sq ft; 300 sq ft × 300¢ = 90,000¢, no seams.
    const result = plan(issueJob());
    expect(result.orderedSqFt).toBe(300);
    expect(result.pieces).toEqual([{ widthFt: 15, lengthFt: 20, source: 'new' }]);
    expect(result.cost).toEqual({ turfCents: 90000, seamCents: 0, totalCents: 90000 });
    const [front, side] = result.areas;
    expect(front).toMatchObject({ id: 'front', areaSqFt: 200, grainAngleDeg: 0 });
    expect(side).toMatchObject({ id: 'side', areaSqFt: 100, grainAngleDeg: 0 });
    expect(front?.cuts).toMatchObject([{ piece: 0, alongFt: 20, acrossFt: 10 }]);
    expect(side?.cuts).toMatchObject([{ piece: 0, alongFt: 20, acrossFt: 5 }]);
    expect(front?.seams).toEqual({ count: 0, sideFt: 0, buttFt: 0 });
    expect(result.shared).toBe(true);
    expect(packingProblems(result)).toEqual([]);
  });

  it('orders nothing when a remnant holds every cut, and says which cut comes from it', () => {
    // Computed by hand: the 10 × 20 and 5 × 20 cuts fill the 15 × 20 remnant exactly.
    const result = plan({ ...issueJob(), remnants: [{ id: 'R-7', widthFt: 15, lengthFt: 20 }] });
    expect(result.orderedSqFt).toBe(0);
    expect(result.pieces).toEqual([
      { widthFt: 15, lengthFt: 20, source: 'remnant', remnantId: 'R-7' },
    ]);
    expect(result.cost?.totalCents).toBe(0);
    expect(result.cutSheet[0]).toMatchObject({ source: 'remnant', remnantId: 'R-7' });
    expect(result.cutSheet[0]?.cuts.map((cut) => cut.area)).toEqual(['front', 'side']);
    expect(packingProblems(result)).toEqual([]);
  });

  it('leaves a remnant too small for any cut out of the pieces', () => {
    // Computed by hand: no cut is shorter than 20 ft, so a 15 × 10 remnant holds none.
    const result = plan({ ...issueJob(), remnants: [{ id: 'R-1', widthFt: 15, lengthFt: 10 }] });
    expect(result.orderedSqFt).toBe(300);
    expect(result.pieces.every((piece) => piece.source === 'new')).toBe(true);
  });

  it('reports the areas planned one by one as an alternative', () => {
    // Computed by hand: with only the 15 ft roll each area alone buys a 15 × 20 piece: 600 sq ft.
    const result = plan({ ...issueJob(), rolls: [{ widthFt: 15 }], costs: undefined });
    const alone = result.alternatives.find((a) => a.kind === 'areas-alone');
    expect(alone?.orderedSqFt).toBe(600);
    expect(result.orderedSqFt).toBe(300);
  });

  it('serves a cut of one area from the offcut of another laid in a different direction', () => {
    // Computed by hand: lawn 30 (east) × 10, grain east: a 10 × 30 cut from a 15 ft piece
    // leaves 5 × 30; the run 5 (east) × 30 (north), grain north, is a 5 × 30 cut that fits
    // there. One 15 × 30 piece = 450 sq ft, against 900 sq ft planned alone.
    const result = plan({
      areas: [
        { id: 'lawn', area: rect(0, 0, 30, 10), grain: { angleDeg: 0 } },
        { id: 'run', area: rect(40, 0, 5, 30), grain: { angleDeg: 90 } },
      ],
      rolls: [{ widthFt: 15 }],
    });
    expect(result.orderedSqFt).toBe(450);
    expect(result.pieces).toEqual([{ widthFt: 15, lengthFt: 30, source: 'new' }]);
    expect(result.alternatives.find((a) => a.kind === 'areas-alone')?.orderedSqFt).toBe(900);
    expect(packingProblems(result)).toEqual([]);
  });

  it('picks per area the roll width that orders least and says why', () => {
    // Computed by hand: a 12 × 30 area, grain along the 30: a 12 ft roll buys 12 × 30 = 360
    // sq ft, a 15 ft roll 15 × 30 = 450 sq ft (+90).
    const result = plan({
      areas: [{ id: 'strip', area: rect(0, 0, 30, 12), grain: { angleDeg: 0 } }],
      rolls: [{ widthFt: 15 }, { widthFt: 12 }],
    });
    expect(result.orderedSqFt).toBe(360);
    const choices = result.areas[0]?.rollChoices ?? [];
    expect(choices.find((c) => c.chosen)).toMatchObject({ rollWidthFt: 12, jobOrderedSqFt: 360 });
    expect(choices.find((c) => !c.chosen)).toMatchObject({ rollWidthFt: 15, jobOrderedSqFt: 450 });
    expect(choices.find((c) => !c.chosen)?.why).toMatch(/\+90 sq ft/);
  });

  /** A 30 × 10 area, grain east; a 5 ft roll (two strips, one 30 ft side seam) or a 15 ft one. */
  function seamTradeJob(costs?: Json): Json {
    return {
      areas: [{ id: 'lawn', area: rect(0, 0, 30, 10), grain: { angleDeg: 0 } }],
      rolls: [{ widthFt: 15 }, { widthFt: 5 }],
      ...(costs ? { costs } : {}),
    };
  }

  it('without costs buys least turf even with a seam', () => {
    // Computed by hand: 5 ft roll: 2 × 5 × 30 = 300 sq ft, one 30 ft side seam; 15 ft roll:
    // 15 × 30 = 450 sq ft, no seam. Least turf wins: 300.
    const result = plan(seamTradeJob());
    expect(result.orderedSqFt).toBe(300);
    expect(result.seams).toEqual({ count: 1, sideFt: 30, buttFt: 0 });
    expect(result.cost).toBeUndefined();
  });

  it('with costs loses the saved turf when the seam costs more', () => {
    // Computed by hand: 5 ft: 300 × 300¢ + 30 ft × 2,000¢ = 150,000¢; 15 ft: 450 × 300¢ =
    // 135,000¢. The seamless 15 ft piece is cheaper installed.
    const result = plan(seamTradeJob({ turfCentsPerSqFt: 300, sideSeamCentsPerFt: 2000 }));
    expect(result.orderedSqFt).toBe(450);
    expect(result.cost).toEqual({ turfCents: 135000, seamCents: 0, totalCents: 135000 });
    const kinds = Object.fromEntries(result.alternatives.map((a) => [a.kind, a]));
    expect(kinds['least-turf']?.orderedSqFt).toBe(300);
    expect(kinds['least-turf']?.cost?.totalCents).toBe(150000);
    expect(kinds['fewest-seams']?.seams.count).toBe(0);
    expect(kinds['cheapest-installed']?.cost?.totalCents).toBe(135000);
  });

  it('with a cheap seam keeps the saving', () => {
    // Computed by hand: 5 ft: 90,000¢ + 30 × 150¢ = 94,500¢ < 135,000¢ for the 15 ft piece.
    const result = plan(seamTradeJob({ turfCentsPerSqFt: 300, sideSeamCentsPerFt: 150 }));
    expect(result.orderedSqFt).toBe(300);
    expect(result.cost).toEqual({ turfCents: 90000, seamCents: 4500, totalCents: 94500 });
  });

  it('points the grain the way the facing asks', () => {
    // Computed by hand: facing W is 180° (blades toward the west side): every cut runs
    // from east to west, and the cut sheet arrow says W.
    const result = plan({
      areas: [{ id: 'yard', area: rect(0, 0, 20, 10), grain: { facing: 'W' } }],
      rolls: [{ widthFt: 15 }],
    });
    const area = result.areas[0];
    expect(area?.grainAngleDeg).toBe(180);
    expect(area?.grainSource).toBe('facing');
    for (const cut of area?.cuts ?? [])
      expect(turnGap(cutGrainDirection(cut), 180)).toBeLessThan(1e-6);
    expect(result.cutSheet[0]?.cuts[0]?.grainArrow).toMatchObject({ angleDeg: 180, compass: 'W' });
  });

  it('searches only the facing range', () => {
    // Computed by hand: a 30 (east) × 10 area, 15 ft roll. Grain east: one 15 × 30 piece =
    // 450 sq ft; grain north: two 15 × 10 pieces = 300 sq ft. Facing NE ± 45° allows both
    // (0°–90°) and takes north; facing E ± 10° must stay near east: 450 sq ft.
    const job = (grain: Json): Json => ({
      areas: [{ id: 'yard', area: rect(0, 0, 30, 10), grain }],
      rolls: [{ widthFt: 15 }],
    });
    const wide = plan(job({ facing: 'NE', toleranceDeg: 45 }));
    expect(wide.orderedSqFt).toBe(300);
    expect(wide.areas[0]?.grainAngleDeg).toBe(90);
    const narrow = plan(job({ facing: 'E', toleranceDeg: 10 }));
    expect(narrow.orderedSqFt).toBe(450);
    expect(turnGap(narrow.areas[0]?.grainAngleDeg ?? NaN, 0)).toBeLessThanOrEqual(10);
  });

  it('is deterministic', () => {
    const job = { ...issueJob(), remnants: [{ id: 'R-2', widthFt: 6, lengthFt: 25 }] };
    expect(JSON.stringify(plan(job))).toBe(JSON.stringify(plan(job)));
  });

  it('counts only new pieces as ordered', () => {
    const result = plan({ ...issueJob(), remnants: [{ id: 'R-3', widthFt: 10, lengthFt: 20 }] });
    expect(result.orderedSqFt).toBeCloseTo(newSqFt(result), 6);
    expect(packingProblems(result)).toEqual([]);
  });
});

describe('the independent guillotine check', () => {
  it('accepts side-by-side and end-to-end cuts and rejects a pinwheel', () => {
    // Computed by hand: four 2 × 1 cuts round a 1 × 1 hole in a 3 × 3 piece cannot be
    // separated by any straight through-cut.
    expect(
      isGuillotine([
        { x: 0, y: 0, w: 5, h: 10 },
        { x: 5, y: 0, w: 5, h: 4 },
        { x: 5, y: 4, w: 5, h: 6 },
      ]),
    ).toBe(true);
    const pinwheel = [
      { x: 0, y: 0, w: 2, h: 1 },
      { x: 2, y: 0, w: 1, h: 2 },
      { x: 1, y: 2, w: 2, h: 1 },
      { x: 0, y: 1, w: 1, h: 2 },
    ];
    expect(isGuillotine(pinwheel)).toBe(false);
  });
});
