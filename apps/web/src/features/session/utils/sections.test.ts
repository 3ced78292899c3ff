import { describe, expect, it } from 'vitest';
import { paths } from '../../../config/paths';
import { phoneSectionsFor, sectionsFor } from './sections';

const labels = (list: { label: string }[]) => list.map((s) => s.label);

describe('sections', () => {
  it("gives the crew lead's phone bar Today, Layout and their profile", () => {
    const bar = phoneSectionsFor('crew_lead');
    expect(labels(bar)).toEqual(['Today', 'Layout', 'Profile']);
    expect(bar.map((s) => s.to)).toEqual([paths.today, paths.layout, paths.settings]);
  });

  it('keeps customers out of the crew lead’s rail and bar', () => {
    expect(labels(sectionsFor('crew_lead'))).toEqual(['Today', 'Layout', 'Settings']);
    expect(phoneSectionsFor('crew_lead').some((s) => s.to === paths.customers)).toBe(false);
    expect(sectionsFor('crew_lead').some((s) => s.to === paths.jobs)).toBe(false);
  });

  it('gives the office every section on the phone under its own name', () => {
    expect(labels(phoneSectionsFor('office'))).toEqual([
      'Today',
      'Customers',
      'Jobs',
      'Layout',
      'Settings',
    ]);
  });
});
