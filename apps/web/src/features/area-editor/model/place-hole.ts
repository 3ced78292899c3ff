import { boundingBoxOf } from './measure';
import { findRingProblem } from '@seamwright/takeoff';
import { holeTemplate } from './templates';
import type { EditorDoc, EditorHole, HoleKind, Pt } from './types';

/**
 * A planter or tree ring placed where it fits: the first spot, scanning the outline's box
 * from its middle outwards, where the new hole lies inside the outline clear of the other
 * holes (the planner's own check). Falls back to the box's middle; the problems list then
 * says what is wrong.
 */
export function placeHole(doc: EditorDoc, kind: HoleKind): EditorHole {
  const outer = doc.outer.points;
  const box = boundingBoxOf(outer.length > 0 ? outer : [[0, 0]]);
  const middle: Pt = [(box.minX + box.maxX) / 2, (box.minY + box.maxY) / 2];
  const steps = 8;
  const candidates: Pt[] = [middle];
  for (let i = 1; i < steps; i += 1) {
    for (let j = 1; j < steps; j += 1) {
      candidates.push([
        box.minX + ((box.maxX - box.minX) * i) / steps,
        box.minY + ((box.maxY - box.minY) * j) / steps,
      ]);
    }
  }
  const distance = (p: Pt) => Math.hypot(p[0] - middle[0], p[1] - middle[1]);
  candidates.sort((a, b) => distance(a) - distance(b));
  const rings = doc.holes.map((hole) => hole.points).filter((ring) => ring.length >= 3);
  for (const centre of candidates) {
    const hole = holeTemplate(kind, centre);
    if (outer.length >= 3 && findRingProblem(outer, [...rings, hole.points]) === null) return hole;
  }
  return holeTemplate(kind, middle);
}
