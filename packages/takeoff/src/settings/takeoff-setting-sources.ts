/**
 * Where each default in {@link defaultTakeoffSettings} comes from, in words for the settings
 * screen. Keys are dotted paths into TakeoffSettings; a section key (`labour`) covers every
 * setting below it unless a longer path has its own entry. Keep in step with the comments in
 * default-takeoff-settings.ts (a unit test checks every setting finds a source).
 */
export const takeoffSettingSources: Readonly<Record<string, string>> = {
  'excavation.digDepthIn': 'Common practice: remove 3–4 in of soil and sod; the deeper end',
  'excavation.soilSwellPercent': 'Earthwork references: common earth swells about 20–30 %',
  'excavation.spoilLooseDensityLbPerCuYd':
    'CalRecycle volume-to-weight table: loose dry earth, 2,100 lb per cu yd',
  'base.depthIn': 'Common practice: about 3 in of compacted crushed base',
  'base.looseToCompactedFactor':
    'Shrink/swell tables attributed to FHWA (2007): gravel 1.15 ÷ 0.93 = 1.237',
  'base.densityTonsPerCuYd':
    'Common practice, no published source: supplier figure for crushed stone; set yours',
  'base.orderIncrementCuYd': 'Common practice: yards sell by the half cubic yard',
  'base.orderIncrementTons': 'Common practice: yards sell by the half ton',
  compaction: 'Common practice: about 90 % of maximum dry density; the test is your choice',
  perimeterNails: 'No standard exists; trade guides range 4–24 in. 6 in straight, 3 in on curves',
  seamNails: 'Common practice: about 6 in from the seam, every 6–8 in, both sides',
  'seamTape.widthIn': 'Common practice: 12 in is the common tape width',
  'seamTape.rollLengthFt': 'From memory, no maker’s figure found; set your supplier’s',
  adhesive: 'Derived: a 12 in band at 60–80 sq ft per gallon; the cautious end',
  staples: 'Common practice: staples into bender board every 3 in; off by default',
  edging: 'Common practice: edging where turf meets beds or lawn, held with stakes',
  'edging.stakeSpacingIn': 'Common practice, no published source',
  petPerimeter: 'Common practice: treated 2×4 boards, turf screwed every 4–6 in',
  'infill.landscape': 'Common practice: 1–2 lb per sq ft of sand; 50 lb bags',
  'infill.pet': 'Common practice: 2–3 lb per sq ft with zeolite and coated sand',
  'infill.play': 'Common practice: 2.5–3.5 lb per sq ft, per the tested system’s spec',
  'infill.putting': 'Common practice: about 2–4 lb per sq ft, coarse layer under 30/50 sand',
  rodentWire: 'Common practice, no published source: 4 × 100 ft rolls, 6 in overlap',
  sprinklerCaps: 'Common practice: one cap per removed head, one 1 in cap per closed zone',
  haul: 'Common practice: roll-off boxes 10–40 cu yd, about 10 tons; set your hauler’s figures',
  labour: 'From memory, no published source: production rates vary by crew; set your own',
  equipment: 'From memory, no published source: daily coverage of rented machines',
  finishHeight: 'Common practice: turf top ½–¾ in above hard surfaces; ½ in',
  'turfWeight.latexBackingOzPerSqYd': 'Trade spec sheets: latex backing about 40 oz per sq yd',
  'turfWeight.polyurethaneBackingOzPerSqYd':
    'Trade spec sheets: polyurethane backing about 32 oz per sq yd',
  'turfWeight.assumedBacking': 'Seamwright’s choice: latex, the heavier and more common',
  'turfWeight.liftLimitLb':
    'NIOSH recommended limit for an ideal two-hand lift (OSHA eTool): 51 lb',
};

/** The source text for a dotted setting path: its own entry or its nearest section's. */
export function takeoffSettingSource(path: string): string | undefined {
  const parts = path.split('.');
  for (let length = parts.length; length > 0; length -= 1) {
    const source = takeoffSettingSources[parts.slice(0, length).join('.')];
    if (source) return source;
  }
  return undefined;
}
