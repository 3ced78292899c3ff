import { parseLayoutRequest } from '@seamwright/takeoff';
import type { EdgeTag, LayoutPoint } from '@seamwright/takeoff';

type Point = [number, number];

/**
 * A saved area's drawing, read back from the exact planner request the server saved: the
 * outline and holes, their edge tags and the walkways with their widths (defaults filled in by
 * the planner's own parser). Same shape as the area editor's drawing fields, so a route can
 * hand it to the editor.
 */
export interface SavedDrawing {
  area: { outer: Point[]; holes: Point[][] };
  edges?: (EdgeTag | null)[];
  holeEdges?: (EdgeTag | null)[][];
  trafficPaths: { points: Point[]; widthFt: number }[];
}

const copy = (points: readonly LayoutPoint[]): Point[] => points.map(([x, y]) => [x, y]);

/** The drawing of a saved request, or null if it no longer reads (never expected). */
export function readSavedDrawing(request: unknown): SavedDrawing | null {
  try {
    const parsed = parseLayoutRequest(request);
    const drawing: SavedDrawing = {
      area: { outer: copy(parsed.area.outer), holes: parsed.area.holes.map(copy) },
      trafficPaths: parsed.trafficPaths.map((path) => ({
        points: copy(path.points),
        widthFt: path.widthFt,
      })),
    };
    if (parsed.edges) drawing.edges = [...parsed.edges];
    if (parsed.holeEdges) drawing.holeEdges = parsed.holeEdges.map((tags) => [...tags]);
    return drawing;
  } catch {
    return null;
  }
}

/** Outer ring first, then holes: what the plan drawing outlines. */
export function drawingRings(drawing: SavedDrawing): Point[][] {
  return [drawing.area.outer, ...drawing.area.holes];
}
