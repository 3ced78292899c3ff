import { ringOf } from './ring-edits';
import type { EditorHole, EditorRing, HoleKind, Pt } from './types';

export type OutlineTemplate = 'rectangle' | 'l-shape' | 'circle';

/** How many straight sides a drawn circle gets: close enough for nailing and turf. */
export const CIRCLE_SIDES = 24;

const round = (value: number) => Math.round(value * 1e6) / 1e6;

/** A regular polygon around `centre`, first point due east, counter-clockwise. */
export function polygonise(centre: Pt, radiusFt: number, sides: number): Pt[] {
  return Array.from({ length: sides }, (_, i) => {
    const angle = (2 * Math.PI * i) / sides;
    return [
      round(centre[0] + radiusFt * Math.cos(angle)),
      round(centre[1] + radiusFt * Math.sin(angle)),
    ] as Pt;
  });
}

/**
 * A starting outline, south-west corner at 0, 0, counter-clockwise. Rectangle 30 × 20 ft; L
 * 30 × 25 ft with a 15 × 15 ft notch out of its north-east corner; circle 12 ft across (24
 * sides, every side marked a tight curve). The sizes are only a start: the person types the
 * real ones into the sides list.
 */
export function outlineTemplate(template: OutlineTemplate): EditorRing {
  switch (template) {
    case 'rectangle':
      return ringOf([
        [0, 0],
        [30, 0],
        [30, 20],
        [0, 20],
      ]);
    case 'l-shape':
      return ringOf([
        [0, 0],
        [30, 0],
        [30, 10],
        [15, 10],
        [15, 25],
        [0, 25],
      ]);
    case 'circle':
      return ringOf(polygonise([6, 6], 6, CIRCLE_SIDES), true);
  }
}

/** A 3 ft square planter, or a tree ring 3 ft across (12 sides, curved), centred on `centre`. */
export function holeTemplate(kind: HoleKind, centre: Pt): EditorHole {
  if (kind === 'tree') return { ...ringOf(polygonise(centre, 1.5, 12), true), kind };
  const [x, y] = centre;
  const h = 1.5;
  return {
    ...ringOf([
      [round(x - h), round(y - h)],
      [round(x + h), round(y - h)],
      [round(x + h), round(y + h)],
      [round(x - h), round(y + h)],
    ]),
    kind,
  };
}
