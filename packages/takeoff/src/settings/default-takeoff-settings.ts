import type { TakeoffSettings } from './takeoff-settings-schema.js';

/**
 * Seamwright's starting estimating defaults. A company edits these in Settings; each value
 * says where it comes from. "Common practice" means a trade convention with no published
 * standard behind it (see the trade notes), so treat it as a company choice, not a rule.
 */
export const defaultTakeoffSettings: TakeoffSettings = {
  excavation: {
    // Common practice: remove 3–4 in of soil and sod; we take the deeper end so spoil is not short.
    digDepthIn: 4,
    // Earthwork references put common earth swell at about 20–30 %; 25 % is the middle.
    soilSwellPercent: 25,
    // CalRecycle volume-to-weight conversion table: earth, loose and dry, 2,100 lb per cu yd.
    spoilLooseDensityLbPerCuYd: 2100,
  },
  base: {
    // Common practice: about 3 in of compacted crushed base under landscape turf.
    depthIn: 3,
    // Shrink/swell tables attributed to FHWA (2007): gravel, average gradation, dry — swell 15 %,
    // shrink 7 % → loose-to-compacted factor 1.15 ÷ 0.93 = 1.237.
    looseToCompactedFactor: 1.237,
    // Common practice, no published source: a supplier conversion figure for crushed stone,
    // 1.35 tons per cu yd. Dense-graded base often runs heavier; set your supplier's figure.
    densityTonsPerCuYd: 1.35,
    // Common practice: yards sell by the half cubic yard and half ton.
    orderIncrementCuYd: 0.5,
    orderIncrementTons: 0.5,
  },
  compaction: {
    // Common practice: about 90 % of the maximum dry density; the Proctor method is the company's choice.
    targetPercent: 90,
    testName: 'standard Proctor (ASTM D698)',
  },
  perimeterNails: {
    // No standard exists; trade guides range from 4 in to 24 in. 6 in straight, about half on curves.
    straightSpacingIn: 6,
    curveSpacingIn: 3,
  },
  seamNails: {
    // Common practice when seams are nailed: about 6 in from the seam, every 6–8 in, both sides.
    // Several installers glue seams only; switch isNailed off for that.
    isNailed: true,
    offsetIn: 6,
    spacingIn: 8,
  },
  seamTape: {
    // Tape width: 12 in is the common width. Roll length: from memory (no maker's figure found).
    rollLengthFt: 100,
    widthIn: 12,
  },
  adhesive: {
    // Derived: a 12 in band coated fully is about 1 sq ft per lf of seam; a notched-trowel spread
    // of about 60–80 sq ft per gallon gives 60–80 lf per gallon. We take the cautious end.
    coverageLfPerGal: 60,
    containerGal: 1,
  },
  staples: {
    // Common practice: staples into bender board every 3 in. Off by default (nails everywhere).
    isUsedOnEdging: false,
    spacingIn: 3,
  },
  edging: {
    // Common practice: edging where turf meets planting beds or lawn, held with 12 in stakes.
    tags: ['bed', 'lawn'],
    stockLengthFt: 20,
    wastePercent: 5,
    // Stake spacing: common practice, no published source.
    stakeSpacingIn: 36,
  },
  petPerimeter: {
    // Common practice: treated 2×4 boards around pet areas, turf screwed every 4–6 in so dogs
    // cannot lift the edge. Hard surfaces and house walls are skipped (no board goes there).
    boardLabel: '2×4 treated board',
    skippedTags: ['hard', 'house'],
    stockLengthFt: 8,
    wastePercent: 10,
    screwSpacingIn: 6,
  },
  infill: {
    // Landscape: 1–2 lb per sq ft of sand is the common range; 50 lb is the standard bag.
    landscape: {
      layers: [
        {
          key: 'silica-sand',
          label: 'Silica sand 16/30',
          kind: 'silica-sand',
          rateLbPerSqFt: 1.5,
          bagLb: 50,
        },
      ],
      typicalMinLbPerSqFt: 1,
      typicalMaxLbPerSqFt: 2,
    },
    // Pet: 2–3 lb per sq ft in total, with zeolite for odour and coated sand on top.
    pet: {
      layers: [
        { key: 'zeolite', label: 'Zeolite', kind: 'zeolite', rateLbPerSqFt: 1, bagLb: 50 },
        {
          key: 'coated-sand',
          label: 'Antimicrobial coated sand',
          kind: 'coated-sand',
          rateLbPerSqFt: 1.5,
          bagLb: 50,
        },
      ],
      typicalMinLbPerSqFt: 2,
      typicalMaxLbPerSqFt: 3,
    },
    // Play: 2.5–3.5 lb per sq ft over a shock pad, per the tested system's own spec.
    play: {
      layers: [
        {
          key: 'silica-sand',
          label: 'Silica sand 20/40',
          kind: 'silica-sand',
          rateLbPerSqFt: 3,
          bagLb: 50,
        },
      ],
      typicalMinLbPerSqFt: 2.5,
      typicalMaxLbPerSqFt: 3.5,
    },
    // Putting: about 2–4 lb per sq ft; a light coarse layer under a 30/50 top dressing.
    putting: {
      layers: [
        {
          key: 'base-sand',
          label: 'Silica sand 20/40',
          kind: 'silica-sand',
          rateLbPerSqFt: 1,
          bagLb: 50,
        },
        {
          key: 'top-sand',
          label: 'Silica sand 30/50',
          kind: 'silica-sand',
          rateLbPerSqFt: 1.5,
          bagLb: 50,
        },
      ],
      typicalMinLbPerSqFt: 2,
      typicalMaxLbPerSqFt: 4,
    },
  },
  rodentWire: {
    // Common practice, no published source: 4 ft × 100 ft rolls, strips overlapped 6 in.
    rollWidthFt: 4,
    rollLengthFt: 100,
    overlapIn: 6,
  },
  sprinklerCaps: {
    // Common practice: one threaded cap per removed head (½ in or ¾ in riser); one 1 in cap
    // per zone abandoned at the valve.
    capsPerHead: 1,
    capsPerClosedZone: 1,
    closedZoneCapSizeIn: 1,
  },
  haul: {
    // Roll-off sizes run 10–40 cu yd; dense loads use small boxes. About 10 tons is a common
    // truck maximum (unsourced in the trade article) — set your hauler's figures.
    label: 'roll-off box',
    capacityCuYd: 10,
    capacityTons: 10,
  },
  labour: {
    // From memory, no published source: production rates vary by crew; set your own.
    installSqFtPerCrewHour: 100,
    seamFtPerHour: 20,
    hourIncrement: 0.5,
  },
  equipment: [
    // From memory, no published source: daily coverage of rented machines.
    { key: 'sod-cutter', label: 'Sod cutter', sqFtPerDay: 3000, neededFor: 'excavation' },
    {
      key: 'plate-compactor',
      label: 'Vibratory plate compactor',
      sqFtPerDay: 2000,
      neededFor: 'base',
    },
    { key: 'power-broom', label: 'Power broom', sqFtPerDay: 5000, neededFor: 'infill' },
  ],
  finishHeight: {
    // Common practice: turf top ½–¾ in above adjacent hard surfaces; we use ½ in.
    aboveHardSurfaceIn: 0.5,
  },
  turfWeight: {
    // Trade spec sheets: latex backing ≈ 40 oz/sq yd (8 primary + 32 secondary); polyurethane ≈ 32.
    latexBackingOzPerSqYd: 40,
    polyurethaneBackingOzPerSqYd: 32,
    assumedBacking: 'latex',
    // NIOSH recommended weight limit for an ideal two-hand lift (as cited by an OSHA eTool): 51 lb.
    liftLimitLb: 51,
  },
};
