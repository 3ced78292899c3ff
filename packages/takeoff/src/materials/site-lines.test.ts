import { describe, expect, it } from 'vitest';
import { defaultTakeoffSettings } from '../settings/default-takeoff-settings.js';
import { jobInput, keysOf, lineOf, settingsWith } from './test-support.js';

const { base, excavation, haul } = defaultTakeoffSettings;

describe('base stone lines', () => {
  it('1,000 sq ft at 3 in: 9.26 cu yd compacted × 1.237 → 11.45 cu yd loose, ordered as 11.5', () => {
    // TRADE row 5 (arithmetic) and row 8 (shrink/swell tables attributed to FHWA 2007: 1.237)
    const line = lineOf('base-stone-volume', jobInput());
    expect(line.inputs['compactedCuYd']).toBeCloseTo(9.26, 2);
    expect(line.rawQuantity).toBeCloseTo(9.259 * 1.237, 2);
    expect(line.quantity).toBe(11.5);
    expect(line.unit).toBe('cu yd');
    expect(line.rule).toBe(
      '1,000 sq ft × 3 in ÷ 324 = 9.26 cu yd compacted × 1.237 loose factor = 11.45 cu yd loose (check: about 1 cu yd per 100 sq ft at 3 in ≈ 10 cu yd)',
    );
  });

  it('row 7: with no loose allowance, 9.26 cu yd at 1.35 tons per cu yd ≈ 12.5 tons', () => {
    // common practice, no published source (supplier conversion table 1.35 t per cu yd)
    const settings = settingsWith({ base: { ...base, looseToCompactedFactor: 1 } });
    const line = lineOf('base-stone-tons', jobInput(), settings);
    expect(line.rawQuantity).toBeCloseTo(12.5, 1);
    expect(line.quantity).toBe(12.5);
    expect(line.unit).toBe('tons');
  });

  it('row 6: 108 sq ft at 3 in is exactly 1 cu yd compacted', () => {
    // arithmetic
    const line = lineOf('base-stone-volume', jobInput({ areaSqFt: 108 }));
    expect(line.inputs['compactedCuYd']).toBe(1);
  });

  it('uses the job depth over the company depth and drops base lines at 0 in', () => {
    expect(lineOf('base-stone-volume', jobInput({ baseDepthIn: 4 })).inputs['baseDepthIn']).toBe(4);
    expect(keysOf(jobInput({ baseDepthIn: 0 }))).not.toContain('base-stone-volume');
    expect(keysOf(jobInput({ baseDepthIn: 0 }))).not.toContain('equipment:plate-compactor');
  });

  it('states the compaction target and test as a note line', () => {
    const line = lineOf('compaction', jobInput());
    expect(line.kind).toBe('note');
    expect(line.quantity).toBe(90);
    expect(line.rule).toContain('standard Proctor (ASTM D698)');
  });
});

describe('excavation and haul lines', () => {
  it('rows 9–10: 1,000 sq ft dug 4 in at 25 % swell → 15.43 cu yd loose, 16.2 tons, 2 loads by weight', () => {
    // arithmetic (row 9); CalRecycle loose dry earth 2,100 lb per cu yd (row 10)
    expect(excavation).toMatchObject({
      digDepthIn: 4,
      soilSwellPercent: 25,
      spoilLooseDensityLbPerCuYd: 2100,
    });
    const spoil = lineOf('excavation-spoil', jobInput());
    expect(spoil.quantity).toBe(15.43);
    expect(spoil.rule).toBe(
      '1,000 sq ft × 4 in ÷ 324 = 12.35 cu yd in place × (1 + 25 % swell) = 15.43 cu yd loose',
    );
    const settings = settingsWith({ haul: { ...haul, capacityCuYd: 20, capacityTons: 10 } });
    const loads = lineOf('haul-loads', jobInput(), settings);
    expect(loads.inputs['spoilTons']).toBeCloseTo(16.2, 1);
    expect(loads.quantity).toBe(2);
    expect(loads.rule).toContain('= 32,407 lb = 16.2 tons');
    expect(loads.warnings[0]).toMatch(/Weight, not volume/);
  });

  it('leaves out spoil and the sod cutter when nothing is dug', () => {
    const keys = keysOf(jobInput({ digDepthIn: 0 }));
    expect(keys).not.toContain('excavation-spoil');
    expect(keys).not.toContain('haul-loads');
    expect(keys).not.toContain('equipment:sod-cutter');
  });
});

describe('finish height guidance', () => {
  it('sets the base pile height − ½ in below hard surfaces', () => {
    // common practice: turf top ½–¾ in above adjacent hard surfaces
    const line = lineOf(
      'finish-height',
      jobInput({ turf: { orderedSqFt: 1050, pieces: [], pileHeightIn: 1.75 } }),
    );
    expect(line.kind).toBe('guidance');
    expect(line.quantity).toBe(1.25);
    expect(line.label).toMatch(/below/);
  });

  it('says "above" when the pile is shorter than the finish height', () => {
    const line = lineOf(
      'finish-height',
      jobInput({ usage: 'putting', turf: { orderedSqFt: 1050, pieces: [], pileHeightIn: 0.375 } }),
    );
    expect(line.quantity).toBe(0.125);
    expect(line.label).toMatch(/above/);
  });
});
