import { describe, expect, it } from 'vitest';
import { defaultTakeoffSettings, takeoffSettingSource, takeoffSettingsSchema } from './index.js';

describe('takeoff settings', () => {
  it('ships defaults that pass their own schema', () => {
    expect(takeoffSettingsSchema.parse(defaultTakeoffSettings)).toEqual(defaultTakeoffSettings);
  });

  it('keeps the trade defaults the estimating table names', () => {
    // Shrink/swell tables attributed to FHWA (2007): gravel 1.15 ÷ 0.93 = 1.237
    expect(defaultTakeoffSettings.base.looseToCompactedFactor).toBeCloseTo(1.15 / 0.93, 3);
    // CalRecycle volume-to-weight table: loose dry earth 2,100 lb per cu yd
    expect(defaultTakeoffSettings.excavation.spoilLooseDensityLbPerCuYd).toBe(2100);
    // OSHA eTool citing NIOSH: 51 lb recommended limit for an ideal two-hand lift
    expect(defaultTakeoffSettings.turfWeight.liftLimitLb).toBe(51);
    // common practice, no published source: 3 in base, 90 % compaction, ½ in above hard surfaces
    expect(defaultTakeoffSettings.base.depthIn).toBe(3);
    expect(defaultTakeoffSettings.compaction.targetPercent).toBe(90);
    expect(defaultTakeoffSettings.finishHeight.aboveHardSurfaceIn).toBe(0.5);
  });

  it('rejects impossible values with a path to the field', () => {
    const bad = {
      ...defaultTakeoffSettings,
      perimeterNails: { straightSpacingIn: 0, curveSpacingIn: 3 },
    };
    const result = takeoffSettingsSchema.safeParse(bad);
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(['perimeterNails', 'straightSpacingIn']);
  });

  it('rejects an infill range whose low end is above its high end', () => {
    const infill = {
      ...defaultTakeoffSettings.infill,
      pet: { ...defaultTakeoffSettings.infill.pet, typicalMinLbPerSqFt: 4 },
    };
    expect(takeoffSettingsSchema.safeParse({ ...defaultTakeoffSettings, infill }).success).toBe(
      false,
    );
  });
});

describe('takeoff setting sources', () => {
  function leafPaths(value: unknown, prefix: string): string[] {
    if (value === null || typeof value !== 'object' || Array.isArray(value)) return [prefix];
    return Object.entries(value).flatMap(([key, child]) =>
      leafPaths(child, prefix ? `${prefix}.${key}` : key),
    );
  }

  it('names a source for every default setting', () => {
    const missing = leafPaths(defaultTakeoffSettings, '').filter(
      (path) => !takeoffSettingSource(path),
    );
    expect(missing).toEqual([]);
  });

  it('prefers a setting’s own entry over its section’s', () => {
    expect(takeoffSettingSource('excavation.spoilLooseDensityLbPerCuYd')).toContain('CalRecycle');
    expect(takeoffSettingSource('labour.seamFtPerHour')).toContain('From memory');
    expect(takeoffSettingSource('nothing.here')).toBeUndefined();
  });
});
