import { describe, expect, it } from 'vitest';
import { computeTakeoff } from '../materials/compute-takeoff.js';
import { jobInput } from '../materials/test-support.js';
import { defaultTakeoffSettings } from '../settings/default-takeoff-settings.js';
import { DEFER_TO_LOCAL_PRACTICE } from './caution-texts.js';
import { cautionContextForTakeoff, cautionsFor } from './cautions-for.js';

const keys = (list: { key: string }[]) => list.map((c) => c.key);

describe('cautionsFor', () => {
  it('warns about utilities only when the job digs', () => {
    expect(keys(cautionsFor({ usage: 'landscape', infillKinds: [], isDigging: true }))).toContain(
      'utility-locate',
    );
    expect(
      keys(cautionsFor({ usage: 'landscape', infillKinds: [], isDigging: false })),
    ).not.toContain('utility-locate');
  });

  it('raises silica dust for sand and coated sand, not for zeolite or rubber alone', () => {
    const silica = cautionsFor({
      usage: 'landscape',
      infillKinds: ['silica-sand'],
      isDigging: false,
    }).find((c) => c.key === 'silica-dust');
    // OSHA 29 CFR 1926.1153(f): no dry sweeping where it adds exposure
    expect(silica?.reference).toContain('1926.1153');
    expect(silica?.body).toMatch(/dry-sweep/);
    expect(silica?.body).toMatch(/upwind/);
    expect(silica?.body).toMatch(/action level/);
    expect(
      keys(cautionsFor({ usage: 'pet', infillKinds: ['coated-sand'], isDigging: false })),
    ).toContain('silica-dust');
    expect(
      keys(
        cautionsFor({ usage: 'pet', infillKinds: ['zeolite', 'crumb-rubber'], isDigging: false }),
      ),
    ).not.toContain('silica-dust');
  });

  it('flags rolls above 51 lb for a machine or team lift', () => {
    // NIOSH recommended weight limit 51 lb (as cited by an OSHA eTool); TRADE row 18: 958 lb roll
    const heavy = cautionsFor({
      usage: 'landscape',
      infillKinds: [],
      isDigging: false,
      rollWeightLb: 958,
    }).find((c) => c.key === 'heavy-rolls');
    expect(heavy?.body).toContain('958 lb');
    expect(heavy?.body).toContain('51 lb');
    expect(
      keys(
        cautionsFor({ usage: 'landscape', infillKinds: [], isDigging: false, rollWeightLb: 51 }),
      ),
    ).not.toContain('heavy-rolls');
  });

  it('adds fall height for play areas and the secured perimeter for pets', () => {
    const play = cautionsFor({ usage: 'play', infillKinds: [], isDigging: false }).find(
      (c) => c.key === 'playground-fall-height',
    );
    // ASTM F1292 critical height; CPSC Public Playground Safety Handbook
    expect(play?.reference).toMatch(/ASTM F1292/);
    expect(play?.reference).toMatch(/CPSC/);
    expect(play?.body).toMatch(/shock pad/);
    expect(
      keys(cautionsFor({ usage: 'landscape', infillKinds: [], isDigging: false, hasPets: true })),
    ).toContain('pets-perimeter');
  });

  it('always mentions turf heat, and every caution defers to local practice', () => {
    const all = cautionsFor({
      usage: 'play',
      infillKinds: ['silica-sand'],
      isDigging: true,
      rollWeightLb: 1042,
      hasPets: true,
    });
    expect(keys(all)).toEqual([
      'utility-locate',
      'heavy-rolls',
      'silica-dust',
      'playground-fall-height',
      'pets-perimeter',
      'turf-heat',
    ]);
    for (const caution of all) {
      expect(caution.deferral).toBe(DEFER_TO_LOCAL_PRACTICE);
      expect(caution.body).not.toContain(DEFER_TO_LOCAL_PRACTICE);
      expect(caution.reference.length).toBeGreaterThan(0);
    }
  });
});

describe('cautionContextForTakeoff', () => {
  it('reads digging, infill kinds and roll weight from a computed takeoff', () => {
    const input = jobInput({
      usage: 'pet',
      turf: {
        orderedSqFt: 1500,
        pieces: [{ widthFt: 15, lengthFt: 100 }],
        faceWeightOzPerSqYd: 60,
        backing: 'polyurethane',
      },
    });
    const lines = computeTakeoff(input, defaultTakeoffSettings);
    const context = cautionContextForTakeoff(input, lines, defaultTakeoffSettings);
    expect(context).toMatchObject({
      usage: 'pet',
      isDigging: true,
      infillKinds: ['zeolite', 'coated-sand'],
      liftLimitLb: 51,
    });
    expect(context.rollWeightLb).toBeCloseTo(958.33, 2);
    expect(keys(cautionsFor(context))).toEqual([
      'utility-locate',
      'heavy-rolls',
      'silica-dust',
      'pets-perimeter',
      'turf-heat',
    ]);
  });
});
