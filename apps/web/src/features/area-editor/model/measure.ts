import { edgeLengths, findRingProblem, ringPerimeter, signedArea } from '@seamwright/takeoff';
import type { EditorDoc, Pt } from './types';

export interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export function boundingBoxOf(points: readonly Pt[]): Box {
  const xs = points.map(([x]) => x);
  const ys = points.map(([, y]) => y);
  return {
    minX: Math.min(...xs),
    minY: Math.min(...ys),
    maxX: Math.max(...xs),
    maxY: Math.max(...ys),
  };
}

/** Closed rings that can be measured: 3 points or more. */
function measurable(points: readonly Pt[]): boolean {
  return points.length >= 3;
}

export interface Measures {
  /** Turf area: the outline less its holes (sq ft). */
  areaSqFt: number;
  /** Every edge the turf meets: the outline and round each hole (ft). */
  perimeterFt: number;
  /** Part of the perimeter marked as tight curves (nailed closer). */
  curvedFt: number;
}

/** Area and perimeter as they stand, with the planner's own ring helpers. */
export function measure(doc: EditorDoc): Measures {
  const rings = [doc.outer, ...doc.holes].filter((ring) => measurable(ring.points));
  const outerArea = measurable(doc.outer.points) ? Math.abs(signedArea(doc.outer.points)) : 0;
  const holesArea = doc.holes
    .filter((hole) => measurable(hole.points))
    .reduce((sum, hole) => sum + Math.abs(signedArea(hole.points)), 0);
  const curvedFt = rings.reduce(
    (sum, ring) =>
      sum + edgeLengths(ring.points).reduce((s, length, i) => s + (ring.curved[i] ? length : 0), 0),
    0,
  );
  return {
    areaSqFt: Math.max(0, outerArea - holesArea),
    perimeterFt: rings.reduce((sum, ring) => sum + ringPerimeter(ring.points), 0),
    curvedFt,
  };
}

/** What stops the drawing from being saved, in words (lengths come from the screen). */
export type DrawingProblem =
  | { kind: 'no-outline' }
  | { kind: 'ring'; path: string; detail: string }
  | { kind: 'short-path'; index: number };

/**
 * The planner's checks on the rings (simple, with area, holes inside and apart) plus the
 * editor's own: an outline of 3 points or more and walkways of 2 points or more. Empty
 * holes and walkways are ignored (they are dropped when saving).
 */
export function drawingProblems(doc: EditorDoc): DrawingProblem[] {
  if (!measurable(doc.outer.points)) return [{ kind: 'no-outline' }];
  const problems: DrawingProblem[] = [];
  const holes = doc.holes.filter((hole) => hole.points.length > 0);
  const ring = findRingProblem(
    doc.outer.points,
    holes.map((hole) => hole.points),
  );
  if (ring) problems.push({ kind: 'ring', ...ring });
  doc.paths.forEach((path, index) => {
    if (path.points.length === 1) problems.push({ kind: 'short-path', index });
  });
  return problems;
}
