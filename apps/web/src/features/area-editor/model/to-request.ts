import type { EdgeTag } from '@seamwright/takeoff';
import { ringOf } from './ring-edits';
import type { EditorDoc, EditorHole, HoleKind, Pt } from './types';

type Point = [number, number];

/** The drawing as the planner's request fields (feet; empty holes and walkways left out). */
export interface DrawingFields {
  area: { outer: Point[]; holes: Point[][] };
  edges?: (EdgeTag | null)[];
  holeEdges?: (EdgeTag | null)[][];
  trafficPaths?: { points: Point[]; widthFt: number }[];
}

const copy = (points: readonly Pt[]): Point[] => points.map(([x, y]) => [x, y]);

/** Edge tags are sent only when some edge has one, so an untagged yard sends no `edges`. */
export function toDrawingFields(doc: EditorDoc): DrawingFields {
  const holes = doc.holes.filter((hole) => hole.points.length >= 3);
  const paths = doc.paths.filter((path) => path.points.length >= 2);
  const fields: DrawingFields = {
    area: { outer: copy(doc.outer.points), holes: holes.map((hole) => copy(hole.points)) },
  };
  if (doc.outer.tags.some((tag) => tag !== null)) fields.edges = [...doc.outer.tags];
  if (holes.some((hole) => hole.tags.some((tag) => tag !== null)))
    fields.holeEdges = holes.map((hole) => [...hole.tags]);
  if (paths.length > 0)
    fields.trafficPaths = paths.map((path) => ({
      points: copy(path.points),
      widthFt: path.widthFt,
    }));
  return fields;
}

/** Indices of the outline's sides marked as tight curves, and per hole. */
export function curvedSides(doc: EditorDoc): { outer: number[]; holes: number[][] } {
  const marked = (curved: readonly boolean[]) =>
    curved.flatMap((isCurved, i) => (isCurved ? [i] : []));
  return {
    outer: marked(doc.outer.curved),
    holes: doc.holes.filter((hole) => hole.points.length >= 3).map((hole) => marked(hole.curved)),
  };
}

/** A saved area back into the editor. */
export function fromDrawingFields(
  fields: DrawingFields,
  extras: { curved?: { outer: number[]; holes: number[][] }; holeKinds?: HoleKind[] } = {},
): EditorDoc {
  const withTags = (
    points: readonly Pt[],
    tags: readonly (EdgeTag | null)[] | undefined,
    curved: readonly number[] | undefined,
  ) => {
    const ring = ringOf(points);
    return {
      points: ring.points,
      tags: points.map((_, i) => tags?.[i] ?? null),
      curved: points.map((_, i) => curved?.includes(i) ?? false),
    };
  };
  const holes: EditorHole[] = fields.area.holes.map((points, i) => ({
    ...withTags(points, fields.holeEdges?.[i], extras.curved?.holes[i]),
    kind: extras.holeKinds?.[i] ?? 'other',
  }));
  return {
    outer: withTags(fields.area.outer, fields.edges, extras.curved?.outer),
    holes,
    paths: (fields.trafficPaths ?? []).map((path) => ({
      points: path.points,
      widthFt: path.widthFt,
    })),
  };
}
