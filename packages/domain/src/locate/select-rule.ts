// Which locate rule applies: the company's own rules first, then the built-in ones, for the
// region and the local day of the notice; the generic default when none is on file.
import type { CalendarDate } from '../calendar/calendar.js';
import { jurisdictionsOf } from '../cancellation/jurisdiction.js';
import type { LocateRule } from './rules.js';
import { defaultLocateRule, locateRules } from './rules.js';

/** `TX`, `us-tx` and `US-TX` are the same region; a non-US code is kept as written. */
export function normalizeLocateRegion(region: string | null | undefined): string | null {
  const tags = jurisdictionsOf(region);
  const state = tags.find((tag) => tag.startsWith('US-'));
  if (state) return state;
  const raw = (region ?? '').trim().toUpperCase();
  return raw === '' ? null : raw;
}

function inForce(rule: LocateRule, date: CalendarDate): boolean {
  return (
    rule.effectiveFrom <= date && (rule.effectiveUntil === null || date <= rule.effectiveUntil)
  );
}

export interface SelectedLocateRule {
  rule: LocateRule;
  /** The region as read (`US-TX`), or null when the company has none. */
  region: string | null;
  /** True when no rule is on file for the region and the generic default was used. */
  isDefault: boolean;
}

export function selectLocateRule(
  region: string | null | undefined,
  noticeDate: CalendarDate,
  companyRules: readonly LocateRule[] = [],
): SelectedLocateRule {
  const normalized = normalizeLocateRegion(region);
  if (normalized) {
    for (const list of [companyRules, locateRules]) {
      const rule = list.find(
        (candidate) =>
          normalizeLocateRegion(candidate.region) === normalized && inForce(candidate, noticeDate),
      );
      if (rule) return { rule, region: normalized, isDefault: false };
    }
  }
  return { rule: defaultLocateRule, region: normalized, isDefault: true };
}
