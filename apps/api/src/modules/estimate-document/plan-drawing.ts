// One area's plan as vector drawing, north up: each cut toned and hatched by the roll piece it
// comes from (strong inside the area, faint where it runs past the edge and is trimmed off),
// walkways, side seams dashed, butt seams dotted, grain arrows, the outline with its side
// lengths, piece numbers, a scale bar and a north arrow.
import type { LayoutPoint } from '@seamwright/takeoff';
import { ink } from './document-layout.js';
import type { Layout } from './document-layout.js';
import type { EstimateDocumentArea } from './estimate-document.types.js';
import { fillPiece, pieceFill, polygonPath } from './piece-fills.js';
import { fitPlan, planPoints } from './plan-frame.js';
import type { PlanFrame } from './plan-frame.js';
import { edgeLengths, grainArrow, scaleAndNorth } from './plan-marks.js';
import { drawWalkwayBand } from './walkway-band.js';

/** Room around the plan for the side lengths printed outside the outline. */
const labelInset = 26;
/** The strip under the plan that holds the scale bar and the north arrow. */
export const planFooterHeight = 44;

function lerp(a: LayoutPoint, b: LayoutPoint, t: number): LayoutPoint {
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
}

function ringsOf(area: EstimateDocumentArea): (readonly LayoutPoint[])[] {
  if (!area.outline) return [];
  return [area.outline.outer, ...(area.outline.holes ?? [])];
}

function clipToArea(
  doc: PDFKit.PDFDocument,
  rings: readonly (readonly LayoutPoint[])[],
  frame: PlanFrame,
) {
  for (const ring of rings) polygonPath(doc, ring.map(frame.toPage));
  doc.clip('even-odd');
}

function drawCuts(layout: Layout, area: EstimateDocumentArea, frame: PlanFrame): void {
  const { doc } = layout;
  const rings = ringsOf(area);
  const polygons = area.plan.cuts.map((cut) => cut.corners.map(frame.toPage));
  // Faint everywhere first (the turf trimmed off past the edge), then strong inside the area.
  if (rings.length > 0) {
    area.plan.cuts.forEach((cut, i) =>
      fillPiece(doc, polygons[i] ?? [], pieceFill(cut.piece), 0.35),
    );
    doc.save();
    clipToArea(doc, rings, frame);
  }
  area.plan.cuts.forEach((cut, i) => fillPiece(doc, polygons[i] ?? [], pieceFill(cut.piece)));
  if (rings.length > 0) doc.restore();
  doc.save().lineWidth(0.5).strokeColor(ink.rule);
  for (const polygon of polygons) {
    polygonPath(doc, polygon);
    doc.stroke();
  }
  doc.restore();
}

function drawWalkways(layout: Layout, area: EstimateDocumentArea, frame: PlanFrame): void {
  const rings = ringsOf(area);
  const { doc } = layout;
  doc.save();
  // Only the part inside the area is walked on turf.
  if (rings.length > 0) clipToArea(doc, rings, frame);
  for (const path of area.trafficPaths ?? [])
    drawWalkwayBand(doc, path.points.map(frame.toPage), path.widthFt * frame.scale);
  doc.restore();
}

function drawSeams(layout: Layout, area: EstimateDocumentArea, frame: PlanFrame): void {
  const { doc } = layout;
  for (const seam of area.plan.seamLines) {
    const [from, to] = [frame.toPage(seam.from), frame.toPage(seam.to)];
    doc.save().strokeColor(ink.text);
    if (seam.kind === 'side') doc.lineWidth(1.4).dash(6, { space: 3 });
    else doc.lineWidth(1.8).lineCap('round').dash(0.1, { space: 3.2 });
    doc.moveTo(from[0], from[1]).lineTo(to[0], to[1]).stroke();
    doc.restore();
  }
}

function drawGrainAndNumbers(layout: Layout, area: EstimateDocumentArea, frame: PlanFrame): void {
  const { doc } = layout;
  for (const cut of area.plan.cuts) {
    const [startLeft, startRight, endRight, endLeft] = cut.corners;
    const start = lerp(startLeft, startRight, 0.5);
    const end = lerp(endLeft, endRight, 0.5);
    const alongPt = cut.alongFt * frame.scale;
    const acrossPt = cut.acrossFt * frame.scale;
    const arrow = Math.min(18, alongPt * 0.2, acrossPt * 0.7);
    if (arrow >= 6) {
      grainArrow(doc, frame.toPage(lerp(start, end, 0.2)), area.plan.grainAngleDeg, arrow);
      grainArrow(doc, frame.toPage(lerp(start, end, 0.8)), area.plan.grainAngleDeg, arrow);
    }
    if (acrossPt < 11 || alongPt < 14) continue;
    const label = String(cut.piece + 1);
    const [cx, cy] = frame.toPage(lerp(start, end, 0.5));
    doc.font('bold').fontSize(9);
    const width = Math.max(doc.widthOfString(label) + 6, 12);
    doc
      .save()
      .roundedRect(cx - width / 2, cy - 6.5, width, 13, 6.5)
      .fill('#ffffff')
      .restore();
    doc
      .save()
      .lineWidth(0.6)
      .strokeColor(ink.text)
      .roundedRect(cx - width / 2, cy - 6.5, width, 13, 6.5)
      .stroke()
      .restore();
    doc
      .fillColor(ink.text)
      .text(label, cx - width / 2, cy - 5.5, { width, align: 'center', lineBreak: false });
  }
}

function drawOutline(layout: Layout, area: EstimateDocumentArea, frame: PlanFrame): void {
  const { doc } = layout;
  const rings = ringsOf(area);
  if (rings.length === 0) return;
  doc.save().lineWidth(1.8).lineJoin('round').strokeColor(ink.text);
  for (const ring of rings) {
    polygonPath(doc, ring.map(frame.toPage));
    doc.stroke();
  }
  doc.restore();
}

/** Draws the plan in a box `maxHeight` tall at the cursor; returns the height used. */
export function drawPlan(
  layout: Layout,
  area: EstimateDocumentArea,
  maxHeight: number,
  units: 'imperial' | 'metric',
): number {
  const points = planPoints(ringsOf(area), area.plan.cuts, area.trafficPaths ?? []);
  if (points.length === 0) return 0;
  const box = {
    x: layout.left,
    y: layout.y,
    width: layout.width,
    maxHeight: maxHeight - planFooterHeight,
  };
  const frame = fitPlan(points, box, labelInset);
  drawCuts(layout, area, frame);
  drawWalkways(layout, area, frame);
  drawSeams(layout, area, frame);
  drawOutline(layout, area, frame);
  drawGrainAndNumbers(layout, area, frame);
  if (area.outline) edgeLengths(layout, area.outline.outer, frame, units);
  const footerY = frame.y + frame.height + labelInset - 6;
  scaleAndNorth(layout, frame, footerY, units);
  return footerY + planFooterHeight - layout.y;
}
