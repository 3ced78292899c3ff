import { describe, expect, it } from 'vitest';
import { sectionTitle, settingLabel } from './setting-label';

describe('settingLabel', () => {
  it('turns a settings path into words with the unit in brackets', () => {
    expect(settingLabel('excavation.spoilLooseDensityLbPerCuYd')).toEqual({
      section: 'excavation',
      label: 'Spoil loose density (lb per cu yd)',
    });
    expect(settingLabel('base.depthIn').label).toBe('Depth (in)');
    expect(settingLabel('excavation.soilSwellPercent').label).toBe('Soil swell (%)');
    expect(settingLabel('labour.installSqFtPerCrewHour').label).toBe(
      'Install (sq ft per crew hour)',
    );
    expect(sectionTitle('perimeterNails')).toBe('Perimeter nails');
  });
});
