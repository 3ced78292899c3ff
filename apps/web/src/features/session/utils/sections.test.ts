import { describe, expect, it } from 'vitest';
import { paths } from '../../../config/paths';
import { phoneSectionsFor, sectionsFor } from './sections';

const labels = (list: { label: string }[]) => list.map((s) => s.label);

describe('sections', () => {
  it("gives the crew lead's phone bar Today, Layout, Stock and their profile", () => {
    const bar = phoneSectionsFor('crew_lead');
    expect(labels(bar)).toEqual(['Today', 'Layout', 'Stock', 'Profile']);
    expect(bar.map((s) => s.to)).toEqual([paths.today, paths.layout, paths.stock, paths.settings]);
  });

  it('keeps customers out of the crew lead’s rail and bar', () => {
    expect(labels(sectionsFor('crew_lead'))).toEqual([
      'Today',
      'Calendar',
      'Layout',
      'Stock',
      'Settings',
    ]);
    expect(phoneSectionsFor('crew_lead').some((s) => s.to === paths.customers)).toBe(false);
    expect(sectionsFor('crew_lead').some((s) => s.to === paths.jobs)).toBe(false);
  });

  it('gives every role the Stock section, but only the crew lead’s phone bar', () => {
    for (const role of ['owner', 'office', 'bookkeeper', 'crew_lead'] as const)
      expect(labels(sectionsFor(role))).toContain('Stock');
    expect(labels(phoneSectionsFor('owner'))).not.toContain('Stock');
  });

  it('shows the Calendar to those who read bookings, not to bookkeepers', () => {
    expect(labels(sectionsFor('office'))).toContain('Calendar');
    expect(labels(sectionsFor('bookkeeper'))).not.toContain('Calendar');
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

  it('gives owners, bookkeepers and the office Invoices, and the bookkeeper’s phone bar too', () => {
    for (const role of ['owner', 'office', 'bookkeeper'] as const)
      expect(labels(sectionsFor(role))).toContain('Invoices');
    expect(labels(sectionsFor('crew_lead'))).not.toContain('Invoices');
    expect(labels(phoneSectionsFor('bookkeeper'))).toContain('Invoices');
  });

  it('gives Reports to the owner and the bookkeeper only, never on the phone bar', () => {
    expect(labels(sectionsFor('owner'))).toContain('Reports');
    expect(labels(sectionsFor('bookkeeper'))).toContain('Reports');
    expect(labels(sectionsFor('office'))).not.toContain('Reports');
    expect(labels(sectionsFor('crew_lead'))).not.toContain('Reports');
    expect(labels(phoneSectionsFor('owner'))).not.toContain('Reports');
  });
});
