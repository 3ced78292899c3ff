import { describe, expect, it } from 'vitest';
import { defaultTakeoffSettings } from '../settings/default-takeoff-settings.js';
import { jobInput, keysOf, lineOf, settingsWith } from './test-support.js';

const { perimeterNails, seamNails, staples } = defaultTakeoffSettings;

describe('perimeter nails', () => {
  it.each([
    // TRADE row 17 — arithmetic; spacing is a company setting: 240 lf at 6 in → 480, at 12 in → 240
    { spacing: 6, nails: 480 },
    { spacing: 12, nails: 240 },
  ])('240 lf closed perimeter at $spacing in → $nails nails', ({ spacing, nails }) => {
    const settings = settingsWith({
      perimeterNails: { ...perimeterNails, straightSpacingIn: spacing },
    });
    const line = lineOf('perimeter-nails', jobInput(), settings);
    expect(line.quantity).toBe(nails);
    expect(line.rule).toBe(
      `closed perimeter: 240 lf straight × 12 ÷ ${spacing} in = ${nails} nails`,
    );
  });

  it('nails tight curves at the closer curve spacing', () => {
    // arithmetic: 200 lf ÷ 6 in = 400, 40 lf ÷ 3 in = 160
    const line = lineOf('perimeter-nails', jobInput({ curvedPerimeterFt: 40 }));
    expect(line.quantity).toBe(560);
  });

  it('staples instead of nails along edging when the company staples', () => {
    const settings = settingsWith({ staples: { ...staples, isUsedOnEdging: true } });
    const input = jobInput({ perimeterByTagFt: { bed: 40, hard: 60 } });
    expect(lineOf('perimeter-nails', input, settings).quantity).toBe(400); // 200 lf × 12 ÷ 6
    expect(lineOf('edging-staples', input, settings).quantity).toBe(160); // 40 lf × 12 ÷ 3 in (common practice)
  });
});

describe('seam nails', () => {
  const seams = { sideFt: 40, buttFt: 15, count: 3 };

  it('nails both sides of every seam', () => {
    // arithmetic: per side ceil(55 lf × 12 ÷ 8 in) + 3 seam ends = 83 + 3 = 86; both sides 172
    const line = lineOf('seam-nails', jobInput({ seams }));
    expect(line.quantity).toBe(172);
    expect(line.quantity % 2).toBe(0);
    expect(line.rule).toContain('2 sides');
    expect(line.rule).toContain(`about ${seamNails.offsetIn} in from the seam`);
  });

  it('leaves seam nails out when the company glues seams only, but keeps tape and adhesive', () => {
    const settings = settingsWith({ seamNails: { ...seamNails, isNailed: false } });
    const keys = keysOf(jobInput({ seams }), settings);
    expect(keys).not.toContain('seam-nails');
    expect(keys).toEqual(expect.arrayContaining(['seam-tape', 'seam-adhesive']));
  });
});

describe('seam tape and adhesive', () => {
  it('counts butt seams too', () => {
    // arithmetic: 90 + 25 = 115 lf ÷ 100 ft rolls (roll length from memory) → 2 rolls
    const input = jobInput({ seams: { sideFt: 90, buttFt: 25, count: 3 } });
    expect(lineOf('seam-tape', input).quantity).toBe(2);
    // derived: 115 lf ÷ 60 lf per gal = 1.92 → 2 gal in 1 gal containers
    const adhesive = lineOf('seam-adhesive', input);
    expect(adhesive.rawQuantity).toBeCloseTo(1.917, 3);
    expect(adhesive.quantity).toBe(2);
  });

  it('has no seam lines when the plan has no seams', () => {
    expect(keysOf(jobInput())).not.toContain('seam-tape');
  });
});

describe('edging and pet perimeter', () => {
  it('puts edging and stakes along edges meeting beds or lawn', () => {
    const input = jobInput({ perimeterByTagFt: { bed: 30, lawn: 30, hard: 100 } });
    // arithmetic: 60 lf × 1.05 ÷ 20 ft = 3.15 → 4 boards; 60 × 12 ÷ 36 + 1 = 21 stakes
    expect(lineOf('edging', input).quantity).toBe(4);
    expect(lineOf('edging-stakes', input).quantity).toBe(21);
    expect(lineOf('perimeter-nails', input).quantity).toBe(480);
  });

  it('boards every pet edge except hard surfaces and the house, screwed every 6 in', () => {
    const input = jobInput({ usage: 'pet', perimeterByTagFt: { hard: 40, house: 24, bed: 30 } });
    // arithmetic: 240 − 64 = 176 lf × 1.10 ÷ 8 ft = 24.2 → 25 boards; 176 × 12 ÷ 6 = 352 screws
    expect(lineOf('pet-perimeter-boards', input).quantity).toBe(25);
    expect(lineOf('pet-perimeter-screws', input).quantity).toBe(352);
    // the 64 lf along hard surfaces and the house are still nailed: 64 × 12 ÷ 6 = 128
    expect(lineOf('perimeter-nails', input).quantity).toBe(128);
    expect(keysOf(input)).not.toContain('edging');
  });

  it('secures the perimeter when pets use a landscape area', () => {
    expect(keysOf(jobInput({ hasPets: true }))).toContain('pet-perimeter-boards');
    expect(keysOf(jobInput())).not.toContain('pet-perimeter-boards');
  });
});
