// A walkway as the plan shows it: a white band of its width with a dark edge and a dot
// stipple, so it reads over any piece tone and on a black-and-white print.
import { ink } from './document-layout.js';
import type { PagePoint } from './plan-frame.js';
import { polygonPath } from './piece-fills.js';

/** One rectangle per segment of the polyline, `width` points wide (joints overlap). */
export function walkwayPolygons(points: readonly PagePoint[], width: number): PagePoint[][] {
  const half = width / 2;
  const polygons: PagePoint[][] = [];
  points.slice(1).forEach((to, index) => {
    const from = points[index];
    if (!from) return;
    const length = Math.hypot(to[0] - from[0], to[1] - from[1]);
    if (length === 0) return;
    const [ux, uy] = [(to[0] - from[0]) / length, (to[1] - from[1]) / length];
    const [nx, ny] = [-uy * half, ux * half];
    // Half a width past each joint, so corners are filled; square at the walkway's two ends.
    const back = index === 0 ? 0 : half;
    const ahead = index === points.length - 2 ? 0 : half;
    const start: PagePoint = [from[0] - ux * back, from[1] - uy * back];
    const end: PagePoint = [to[0] + ux * ahead, to[1] + uy * ahead];
    polygons.push([
      [start[0] + nx, start[1] + ny],
      [end[0] + nx, end[1] + ny],
      [end[0] - nx, end[1] - ny],
      [start[0] - nx, start[1] - ny],
    ]);
  });
  return polygons;
}

function bounds(polygons: readonly PagePoint[][]) {
  const all = polygons.flat();
  const xs = all.map(([x]) => x);
  const ys = all.map(([, y]) => y);
  return {
    minX: Math.min(...xs),
    maxX: Math.max(...xs),
    minY: Math.min(...ys),
    maxY: Math.max(...ys),
  };
}

/**
 * Draws the band: a dark edge and a white inside (one thick stroke, then a thinner white one,
 * so joints stay clean), stippled inside. `points` is the walkway's centre line.
 */
export function drawWalkwayBand(
  doc: PDFKit.PDFDocument,
  points: readonly PagePoint[],
  width: number,
): void {
  const first = points[0];
  if (!first || points.length < 2) return;
  const trace = (): void => {
    doc.moveTo(first[0], first[1]);
    for (const [x, y] of points.slice(1)) doc.lineTo(x, y);
  };
  doc.save().lineJoin('miter').lineCap('butt');
  trace();
  doc.lineWidth(width).strokeColor(ink.text).stroke();
  trace();
  doc
    .lineWidth(Math.max(width - 2.4, 0.5))
    .strokeColor('#ffffff')
    .stroke();
  doc.restore();
  const polygons = walkwayPolygons(points, Math.max(width - 2.4, 0.5));
  const box = bounds(polygons);
  doc.save();
  for (const polygon of polygons) polygonPath(doc, polygon);
  doc.clip('non-zero');
  // A stipple of dots in rows: no roll piece uses it, so a walkway never reads as a piece.
  doc.lineWidth(1.3).lineCap('round').dash(0.01, { space: 4 }).strokeColor(ink.text);
  for (let y = box.minY + 2; y <= box.maxY; y += 4)
    doc.moveTo(box.minX + ((y - box.minY) % 8 < 4 ? 0 : 2), y).lineTo(box.maxX, y);
  doc.stroke();
  doc.restore();
}
