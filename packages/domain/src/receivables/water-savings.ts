// Water a replaced lawn no longer takes, per year. Only regions with a published figure for
// lawn versus water-smart landscape have a rule; elsewhere the dashboard says there is none
// rather than borrow a desert's numbers for a wetter place.

export interface WaterSavingsRule {
  /** Company regions (ISO 3166-2, as on the company) the rule applies to. */
  regions: readonly string[];
  label: string;
  lawnGallonsPerSqFtYear: number;
  replacementGallonsPerSqFtYear: number;
  source: string;
}

export const waterSavingsRules: readonly WaterSavingsRule[] = [
  {
    regions: ['US-NV'],
    label: 'Southern Nevada',
    lawnGallonsPerSqFtYear: 73,
    replacementGallonsPerSqFtYear: 18,
    source:
      'City of Las Vegas water-smart landscape figures: lawn about 73, drip-irrigated landscape about 17–18 gal per sq ft per year',
  },
];

export interface WaterSaved {
  gallonsPerYear: number;
  rule: WaterSavingsRule;
}

/** The rule for `region`, or null when no published figure is stored for it. */
export function waterSavingsRuleFor(region: string | null | undefined): WaterSavingsRule | null {
  if (!region) return null;
  return waterSavingsRules.find((rule) => rule.regions.includes(region)) ?? null;
}

/** Gallons a year saved by `sqFtReplaced` of lawn in `region`, or null without a rule. */
export function waterSavedPerYear(
  sqFtReplaced: number,
  region: string | null | undefined,
): WaterSaved | null {
  const rule = waterSavingsRuleFor(region);
  if (!rule) return null;
  const perSqFt = rule.lawnGallonsPerSqFtYear - rule.replacementGallonsPerSqFtYear;
  return { gallonsPerYear: Math.round(Math.max(0, sqFtReplaced) * perSqFt), rule };
}
