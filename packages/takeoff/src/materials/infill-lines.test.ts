import { describe, expect, it } from 'vitest';
import { defaultTakeoffSettings } from '../settings/default-takeoff-settings.js';
import type { InfillRecipe } from '../settings/takeoff-settings-schema.js';
import { computeTakeoff, takeoffWarnings } from './compute-takeoff.js';
import { jobInput, lineOf, settingsWith } from './test-support.js';

const sand = (rate: number, min: number, max: number): InfillRecipe => ({
  layers: [
    { key: 'sand', label: 'Silica sand', kind: 'silica-sand', rateLbPerSqFt: rate, bagLb: 50 },
  ],
  typicalMinLbPerSqFt: min,
  typicalMaxLbPerSqFt: max,
});

describe('infill lines', () => {
  it('row 12: 600 sq ft of landscape at 1.5 lb → 900 lb → 18 bags', () => {
    // common practice, no published source ([S59]): landscape 1–2 lb per sq ft; 50 lb bags
    const line = lineOf('infill:silica-sand', jobInput({ areaSqFt: 600 }));
    expect(line.inputs['pounds']).toBe(900);
    expect(line.quantity).toBe(18);
    expect(line.rounding).toBe('rounded up to whole 50 lb bags');
  });

  it('row 13: 300 sq ft of putting green at 1.75 lb → 525 lb → 11 bags, and warns below 2 lb', () => {
    // common practice, no published source ([S63]); putting range 2–4 lb per sq ft ([S62] [S65])
    const settings = settingsWith({
      infill: { ...defaultTakeoffSettings.infill, putting: sand(1.75, 2, 4) },
    });
    const lines = computeTakeoff(jobInput({ usage: 'putting', areaSqFt: 300 }), settings);
    const line = lines.find((l) => l.key === 'infill:sand');
    expect(line?.rawQuantity).toBe(10.5);
    expect(line?.quantity).toBe(11);
    expect(takeoffWarnings(lines).map((w) => w.key)).toContain('infill-total');
  });

  it('row 15: pet infill 2–3 lb per sq ft — warns outside the range, quiet inside', () => {
    // common practice, no published source ([S59] [S61])
    const pet = (rate: number) =>
      settingsWith({ infill: { ...defaultTakeoffSettings.infill, pet: sand(rate, 2, 3) } });
    const warningsAt = (rate: number) =>
      lineOf('infill-total', jobInput({ usage: 'pet' }), pet(rate)).warnings;
    expect(warningsAt(1.5)[0]).toMatch(/below the usual 2–3 lb per sq ft for pet turf/);
    expect(warningsAt(3.5)[0]).toMatch(/above the usual 2–3 lb per sq ft for pet turf/);
    expect(warningsAt(2)).toEqual([]);
    expect(warningsAt(2.5)).toEqual([]);
    expect(warningsAt(3)).toEqual([]);
  });

  it('buys every layer of the default pet recipe in whole bags', () => {
    const input = jobInput({ usage: 'pet', areaSqFt: 560 });
    // arithmetic: zeolite 560 lb → 11.2 → 12 bags; coated sand 840 lb → 16.8 → 17 bags
    expect(lineOf('infill:zeolite', input).quantity).toBe(12);
    expect(lineOf('infill:coated-sand', input).quantity).toBe(17);
    expect(lineOf('infill-total', input).quantity).toBe(1400);
  });
});
