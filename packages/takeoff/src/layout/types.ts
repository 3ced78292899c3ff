import type { Point } from '../geometry/types.js';

export type { Point } from '../geometry/types.js';

/** What an edge of the area meets; drives perimeter by tag (edging, nailing, boards). */
export type EdgeTag = 'hard' | 'bed' | 'lawn' | 'fence' | 'house';

/** All edge tags, in a fixed order. */
export const EDGE_TAGS: readonly EdgeTag[] = ['hard', 'bed', 'lawn', 'fence', 'house'];

/** A walkway across the area: a polyline and its width (feet). */
export interface TrafficPath {
  readonly points: Point[];
  readonly widthFt: number;
}

/**
 * A validated layout request with every default filled in (see DOMAIN.md, "The layout
 * planner contract"). Feet, x east, y north; rings in either winding, without a closing point.
 */
export interface LayoutRequest {
  readonly area: { readonly outer: Point[]; readonly holes: Point[][] };
  readonly roll: { readonly widthFt: number; readonly maxLengthFt: number };
  /** Direction the roll's length runs, degrees CCW from +x; absent → the planner chooses. */
  readonly grain?: { readonly angleDeg: number } | undefined;
  /** Pieces are bought in whole multiples of this length (default 1 ft). */
  readonly lengthStepFt: number;
  /** Extra length added at each end of every cut for trimming to the edge (default 0). */
  readonly trimAllowanceFt: number;
  /** Walkways; seams are kept out of them where that costs no extra turf (default none). */
  readonly trafficPaths: TrafficPath[];
  /** Tag per outer-ring edge (edge i runs from point i to point i + 1); null = unknown. */
  readonly edges?: (EdgeTag | null)[] | undefined;
  /** Tags per hole edge, one list per hole; null = unknown. */
  readonly holeEdges?: (EdgeTag | null)[][] | undefined;
}

/**
 * What callers may pass to `planLayout`: a request with optional fields left out (defaults
 * as in {@link LayoutRequest}); traffic paths may be plain polylines.
 */
export interface LayoutRequestInput {
  readonly area: {
    readonly outer: readonly Point[];
    readonly holes?: readonly (readonly Point[])[];
  };
  readonly roll: { readonly widthFt: number; readonly maxLengthFt?: number };
  readonly grain?: { readonly angleDeg: number } | null;
  readonly lengthStepFt?: number;
  readonly trimAllowanceFt?: number;
  readonly trafficPaths?: readonly (
    readonly Point[] | { readonly points: readonly Point[]; readonly widthFt?: number }
  )[];
  readonly edges?: readonly (EdgeTag | null)[];
  readonly holeEdges?: readonly (readonly (EdgeTag | null)[])[];
}

/** A piece bought from the roll: full roll width, length a whole multiple of the step. */
export interface LayoutPiece {
  readonly widthFt: number;
  readonly lengthFt: number;
}

/** A rectangle laid in the area; `along` is the grain direction. */
export interface LayoutCut {
  /** Index into `pieces` of the piece this cut comes from. */
  readonly piece: number;
  readonly alongFt: number;
  readonly acrossFt: number;
  /** Corners in area coordinates: start-left, start-right, end-right, end-left (along the grain). */
  readonly corners: [Point, Point, Point, Point];
  /** Strip (band) number, counted across the grain from the first strip. */
  readonly strip: number;
  /** Where in its piece the cut lies: from the piece's left edge and from its start. */
  readonly acrossOffsetFt: number;
  readonly alongOffsetFt: number;
}

/** A seam for drawing: side seams run along the grain, butt seams across it. */
export interface SeamLine {
  readonly kind: 'side' | 'butt';
  readonly from: Point;
  readonly to: Point;
  readonly lengthFt: number;
}

/** A seam that still runs through a walkway, and for how long. */
export interface TrafficSeamCrossing {
  readonly seam: number;
  readonly path: number;
  readonly kind: 'side' | 'butt';
  readonly lengthFt: number;
}

/** Grain arrow for the crew: angle (CCW from east), compass bearing and word. */
export interface GrainArrow {
  readonly angleDeg: number;
  readonly bearingDeg: number;
  readonly compass: string;
}

/** One cut as the crew reads it off a piece. */
export interface CutSheetCut {
  readonly cut: number;
  readonly acrossFromFt: number;
  readonly acrossToFt: number;
  readonly alongFromFt: number;
  readonly alongToFt: number;
  /** Where it goes, in words, e.g. "north-west, 0–15 ft from the west edge". */
  readonly goes: string;
  /** The parts of `goes`, for screens that show lengths in their own units: "north-west". */
  readonly position: string;
  /** The edge the strips are measured from: "west". */
  readonly fromEdge: string;
  /** How far from that edge the cut starts and ends (ft). */
  readonly fromEdgeStartFt: number;
  readonly fromEdgeEndFt: number;
}

/** One line of the cut sheet: a piece to cut from the roll and what it becomes. */
export interface CutSheetEntry {
  readonly piece: number;
  readonly lengthFt: number;
  readonly widthFt: number;
  readonly cuts: CutSheetCut[];
  readonly grainArrow: GrainArrow;
}

/** Another direction the planner looked at, for comparison. */
export interface LayoutAlternative {
  readonly grainAngleDeg: number;
  readonly orderedSqFt: number;
  readonly seamCount: number;
}

/** The plan: what to buy, where each cut goes, the seams and the figures for estimating. */
export interface LayoutPlan {
  readonly areaSqFt: number;
  readonly orderedSqFt: number;
  readonly grainAngleDeg: number;
  /** 'given' when the request fixed the grain, 'planner' when the planner chose it. */
  readonly grainSource: 'given' | 'planner';
  readonly pieces: LayoutPiece[];
  readonly cuts: LayoutCut[];
  readonly seams: { readonly count: number; readonly sideFt: number; readonly buttFt: number };
  readonly seamLines: SeamLine[];
  readonly perimeterFt: number;
  /** Perimeter per edge tag (outer and hole edges); untagged edges count as 'unknown'. */
  readonly perimeterByTagFt: Partial<Record<EdgeTag | 'unknown', number>>;
  /** Turf bought but not laid: orderedSqFt − areaSqFt. */
  readonly excessSqFt: number;
  /** excessSqFt as a share of orderedSqFt, in percent. */
  readonly wastePct: number;
  /** What the simple strip layout (one full-width piece per strip part) would order. */
  readonly simpleStripOrderedSqFt: number;
  /** True when offcut reuse (several cuts from one piece) saved turf. */
  readonly offcutReuse: boolean;
  readonly trafficSeamCrossings: TrafficSeamCrossing[];
  readonly cutSheet: CutSheetEntry[];
  readonly alternatives: LayoutAlternative[];
}
