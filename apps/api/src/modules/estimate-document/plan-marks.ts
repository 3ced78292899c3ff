// The marks around and on a plan drawing: grain arrows, edge lengths, the scale bar and the
// north arrow. All in black or dark grey, so they survive any print.
import { formatLength, formatNumber } from '@seamwright/takeoff';
import type { LayoutPoint } from '@seamwright/takeoff';
import { ink } from './document-layout.js';
import type { Layout } from './document-layout.js';
import type { PagePoint, PlanFrame } from './plan-frame.js';
import { scaleBarLength } from './plan-frame.js';

type Units = 'imperial' | 'metric';

/** An arrow of `length` points centred on `at`, pointing along the grain (degrees CCW from east). */
export function grainArrow(
  doc: PDFKit.PDFDocument,
  at: PagePoint,
  angleDeg: number,
  length: number,
) {
  const rad = (angleDeg * Math.PI) / 180;
  // Page y runs down, so the plan's north-going component is negated.
  const [dx, dy] = [Math.cos(rad), -Math.sin(rad)];
  const half = length / 2;
  const tip: PagePoint = [at[0] + dx * half, at[1] + dy * half];
  const tail: PagePoint = [at[0] - dx * half, at[1] - dy * half];
  const head = Math.min(5, length * 0.4);
  const [nx, ny] = [-dy, dx];
  const base: PagePoint = [tip[0] - dx * head, tip[1] - dy * head];
  doc.save().lineWidth(1).strokeColor(ink.text).lineCap('round');
  doc.moveTo(tail[0], tail[1]).lineTo(base[0], base[1]).stroke();
  doc
    .moveTo(tip[0], tip[1])
    .lineTo(base[0] + nx * head * 0.5, base[1] + ny * head * 0.5)
    .lineTo(base[0] - nx * head * 0.5, base[1] - ny * head * 0.5)
    .closePath()
    .fill(ink.text);
  doc.restore();
}

function ringIsCounterClockwise(ring: readonly LayoutPoint[]): boolean {
  let twiceArea = 0;
  ring.forEach(([x1, y1], index) => {
    const [x2, y2] = ring[(index + 1) % ring.length] ?? [x1, y1];
    twiceArea += x1 * y2 - x2 * y1;
  });
  return twiceArea > 0;
}

/**
 * Each side of the outer ring long enough to carry it gets its length, just outside the
 * outline, level (never rotated) so it reads without turning the page.
 */
export function edgeLengths(
  layout: Layout,
  ring: readonly LayoutPoint[],
  frame: PlanFrame,
  units: Units,
) {
  const { doc } = layout;
  const outwardSign = ringIsCounterClockwise(ring) ? 1 : -1;
  doc.font('regular').fontSize(7.5).fillColor(ink.text);
  ring.forEach((from, index) => {
    const to = ring[(index + 1) % ring.length];
    if (!to) return;
    const lengthFt = Math.hypot(to[0] - from[0], to[1] - from[1]);
    const label = formatLength(lengthFt, { system: units });
    const textWidth = doc.widthOfString(label);
    if (lengthFt * frame.scale < textWidth + 10) return;
    // Outward normal in plan feet (x east, y north), then turned into page directions.
    const nx = (outwardSign * (to[1] - from[1])) / lengthFt;
    const ny = (outwardSign * -(to[0] - from[0])) / lengthFt;
    const [mx, my] = frame.toPage([(from[0] + to[0]) / 2, (from[1] + to[1]) / 2]);
    const offset = 4 + Math.abs(nx) * (textWidth / 2) + Math.abs(ny) * 5;
    const cx = mx + nx * offset;
    const cy = my - ny * offset;
    doc.text(label, cx - textWidth / 2, cy - 4.5, { lineBreak: false, features: ['tnum'] });
  });
}

/** Scale bar on the left of the strip at `y`, north arrow on the right. */
export function scaleAndNorth(layout: Layout, frame: PlanFrame, y: number, units: Units): void {
  const { doc } = layout;
  const bar = scaleBarLength(frame.planWidthFt, units);
  const barWidth = bar.feet * frame.scale;
  const label =
    bar.metres === null
      ? formatLength(bar.feet, { system: units })
      : `${formatNumber(bar.metres)} m`;
  const x = layout.left;
  const baseY = y + 16;
  doc.save().lineWidth(1).strokeColor(ink.text);
  doc.rect(x, baseY - 4, barWidth / 2, 4).fill(ink.text);
  doc.rect(x, baseY - 4, barWidth, 4).stroke();
  doc.restore();
  doc.font('regular').fontSize(8).fillColor(ink.text);
  doc.text('0', x - 2, baseY + 2, { lineBreak: false });
  const labelWidth = doc.widthOfString(label);
  doc.text(label, x + barWidth - labelWidth / 2, baseY + 2, {
    lineBreak: false,
    features: ['tnum'],
  });
  doc.text('Scale', x + barWidth + labelWidth / 2 + 8, baseY + 2, { lineBreak: false });

  const nx = layout.right - 10;
  const top = y + 2;
  doc.save().lineWidth(1).strokeColor(ink.text).lineJoin('round');
  doc
    .moveTo(nx, top)
    .lineTo(nx + 6, top + 18)
    .lineTo(nx, top + 13)
    .closePath()
    .fill(ink.text);
  doc
    .moveTo(nx, top)
    .lineTo(nx - 6, top + 18)
    .lineTo(nx, top + 13)
    .closePath()
    .stroke();
  doc.restore();
  doc.font('bold').fontSize(9).fillColor(ink.text);
  doc.text('N', nx - 3, top + 20, { lineBreak: false });
}
