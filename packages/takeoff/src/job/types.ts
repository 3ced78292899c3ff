import type {
  EdgeTag,
  GrainArrow,
  LayoutRequest,
  Point,
  SeamLine,
  TrafficSeamCrossing,
} from '../layout/types.js';

/** The eight compass sides a grain may face (the side of the area the blades lean toward). */
export type CompassFacing = 'N' | 'E' | 'S' | 'W' | 'NE' | 'NW' | 'SE' | 'SW';

/** How one area's grain is constrained. */
export type JobGrain =
  /** The planner chooses the direction (0–180°, the lean does not matter). */
  | { readonly kind: 'free' }
  /** A fixed direction, degrees CCW from +x (east). */
  | { readonly kind: 'angle'; readonly angleDeg: number }
  /** Blades lean toward `facing`, turned at most `toleranceDeg` either way. */
  | {
      readonly kind: 'facing';
      readonly facing: CompassFacing;
      /** The facing as a direction, degrees CCW from east (E 0, N 90, W 180, S 270). */
      readonly centreDeg: number;
      readonly toleranceDeg: number;
    };

/** One validated area of a job: a single-area request (its roll is filled in per roll width). */
export interface JobArea {
  readonly id: string;
  /** The single-area request, planned with `rolls[0]`; grain left out (see `grain`). */
  readonly request: LayoutRequest;
  readonly grain: JobGrain;
}

/** A roll the company can buy from: width across the grain, longest piece. */
export interface JobRoll {
  readonly widthFt: number;
  readonly maxLengthFt: number;
}

/** A piece already in stock: width across the grain, length along it. */
export interface JobRemnant {
  readonly id: string;
  readonly widthFt: number;
  readonly lengthFt: number;
}

/** Installed-cost rates (cents); missing rates count as 0. */
export interface JobCosts {
  readonly turfCentsPerSqFt: number;
  readonly sideSeamCentsPerFt: number;
  readonly buttSeamCentsPerFt: number;
}

/** A validated job request with every default filled in. */
export interface JobRequest {
  readonly areas: readonly JobArea[];
  readonly rolls: readonly JobRoll[];
  readonly remnants: readonly JobRemnant[];
  readonly lengthStepFt: number;
  readonly costs?: JobCosts | undefined;
}

/** A piece of the job: bought new from a roll, or a remnant from stock (listed whole). */
export interface JobPiece {
  readonly widthFt: number;
  readonly lengthFt: number;
  readonly source: 'new' | 'remnant';
  readonly remnantId?: string;
}

/** A rectangle laid in an area; `along` is the area's grain. Corners as in the single-area plan. */
export interface JobCut {
  /** Index into the job's `pieces`. */
  readonly piece: number;
  readonly alongFt: number;
  readonly acrossFt: number;
  /** Start-left, start-right, end-right, end-left, looking along the grain. */
  readonly corners: [Point, Point, Point, Point];
  readonly strip: number;
  /** Where the cut lies in its piece: from the piece's left edge, and from its start. */
  readonly acrossOffsetFt: number;
  readonly alongOffsetFt: number;
}

/** Seam totals. */
export interface SeamTotals {
  readonly count: number;
  readonly sideFt: number;
  readonly buttFt: number;
}

/** Cost breakdown (cents); turf counts only new pieces. */
export interface JobCost {
  readonly turfCents: number;
  readonly seamCents: number;
  readonly totalCents: number;
}

/** One roll width considered for an area, and why it was or was not chosen. */
export interface RollChoice {
  readonly rollWidthFt: number;
  readonly grainAngleDeg: number;
  /** Turf this width orders when the area is planned alone. */
  readonly aloneOrderedSqFt: number;
  readonly seams: SeamTotals;
  readonly chosen: boolean;
  /** What the whole job orders (and costs) with this width here, the rest as planned. */
  readonly jobOrderedSqFt: number;
  readonly jobCostCents?: number;
  readonly why: string;
}

/** The plan of one area within the job. */
export interface JobAreaPlan {
  readonly id: string;
  readonly areaSqFt: number;
  readonly grainAngleDeg: number;
  readonly grainSource: 'given' | 'facing' | 'planner';
  readonly rollWidthFt: number;
  readonly cuts: JobCut[];
  readonly seams: SeamTotals;
  readonly seamLines: SeamLine[];
  readonly perimeterFt: number;
  readonly perimeterByTagFt: Partial<Record<EdgeTag | 'unknown', number>>;
  readonly trafficSeamCrossings: TrafficSeamCrossing[];
  /** What this area orders planned alone with the chosen width and direction. */
  readonly aloneOrderedSqFt: number;
  readonly rollChoices: RollChoice[];
}

/** One cut on the job's cut sheet: which area it goes to and which way its grain points. */
export interface JobCutSheetCut {
  readonly area: string;
  /** Index into that area's `cuts`. */
  readonly cut: number;
  readonly acrossFromFt: number;
  readonly acrossToFt: number;
  readonly alongFromFt: number;
  readonly alongToFt: number;
  readonly goes: string;
  readonly grainArrow: GrainArrow;
}

/** One line of the job's cut sheet: a piece (new or a remnant) and the cuts it yields. */
export interface JobCutSheetEntry {
  readonly piece: number;
  readonly source: 'new' | 'remnant';
  readonly remnantId?: string;
  readonly widthFt: number;
  readonly lengthFt: number;
  readonly cuts: JobCutSheetCut[];
}

/** A whole-job alternative, to show the trade-off between turf, seams and cost. */
export interface JobAlternative {
  readonly kind: 'least-turf' | 'fewest-seams' | 'cheapest-installed' | 'areas-alone';
  readonly orderedSqFt: number;
  readonly seams: SeamTotals;
  readonly cost?: JobCost;
  readonly areas: {
    readonly id: string;
    readonly rollWidthFt: number;
    readonly grainAngleDeg: number;
  }[];
}

/** The job plan (see packages/takeoff/README.md, "Job planner"). */
export interface JobPlan {
  readonly orderedSqFt: number;
  readonly areaSqFt: number;
  /** Remnant area laid in the yard (cut from remnants). */
  readonly remnantSqFtUsed: number;
  readonly pieces: JobPiece[];
  readonly areas: JobAreaPlan[];
  readonly seams: SeamTotals;
  readonly cost?: JobCost;
  /** True when the areas share pieces or remnants; false when planning alone was as good. */
  readonly shared: boolean;
  readonly cutSheet: JobCutSheetEntry[];
  readonly alternatives: JobAlternative[];
}
