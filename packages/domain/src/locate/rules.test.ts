import { describe, expect, it } from 'vitest';
import { calendarOfRule } from './locate-ticket.js';
import { defaultLocateRule, locateRules } from './rules.js';
import { selectLocateRule } from './select-rule.js';

describe('locate rules data', () => {
  const all = [...locateRules, defaultLocateRule];

  it('is plain JSON, so a company rule of the same shape can be stored', () => {
    expect(JSON.parse(JSON.stringify(all))).toEqual(all);
  });

  it('has one rule in force per region at a time, with unique ids and a source', () => {
    expect(new Set(all.map((rule) => rule.id)).size).toBe(all.length);
    for (const rule of all) {
      expect(rule.source.length).toBeGreaterThan(10);
      expect(() => calendarOfRule(rule)).not.toThrow();
    }
    // TRADE.md §6 names these regions.
    expect(locateRules.map((rule) => rule.region).sort()).toEqual([
      'US-CA',
      'US-FL',
      'US-GA',
      'US-NY',
      'US-TX',
    ]);
  });

  it('reads TX, us-tx and US-TX as one region; an unknown or missing one gets the default', () => {
    expect(selectLocateRule('tx', '2025-06-02').rule.id).toBe('us-tx-251-151');
    expect(selectLocateRule('us-tx', '2025-06-02').rule.id).toBe('us-tx-251-151');
    expect(selectLocateRule(null, '2025-06-02')).toMatchObject({ isDefault: true, region: null });
    expect(selectLocateRule('ON', '2025-06-02')).toMatchObject({ isDefault: true, region: 'ON' });
  });
});
