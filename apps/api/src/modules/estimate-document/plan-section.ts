// The plan pages: per area a heading with its figures, the drawing, and a key that ties each
// piece number to its tone and hatch and names the line styles. Two areas share a page when
// both fit; a drawing is never split across pages.
import { formatArea, formatLength, formatNumber } from '@seamwright/takeoff';
import {
  ensureSpace,
  heading,
  ink,
  measureText,
  newPage,
  paragraph,
  textAt,
} from './document-layout.js';
import type { Layout } from './document-layout.js';
import type { EstimateDocumentArea, EstimateDocumentInput } from './estimate-document.types.js';
import { fillPiece, pieceFill } from './piece-fills.js';
import { drawPlan, planFooterHeight } from './plan-drawing.js';
import { fitPlan, planPoints } from './plan-frame.js';
import { grainArrow } from './plan-marks.js';
import { drawWalkwayBand } from './walkway-band.js';

type Units = EstimateDocumentInput['units'];

const compassWords = [
  'east',
  'north-east',
  'north',
  'north-west',
  'west',
  'south-west',
  'south',
  'south-east',
];

/** "north-east (bearing 45°)": the way the blades lean, as the crew reads it on site. */
export function grainDirectionWords(angleDeg: number): string {
  const octant = ((Math.round(angleDeg / 45) % 8) + 8) % 8;
  const bearing = (((90 - angleDeg) % 360) + 360) % 360;
  return `${compassWords[octant] ?? 'east'} (bearing ${formatNumber(bearing, 0)}°)`;
}

function figures(area: EstimateDocumentArea, units: Units): string {
  const parts = [`${formatArea(area.areaSqFt, { system: units })} covered`];
  if (area.plan.orderedSqFt !== undefined)
    parts.push(`${formatArea(area.plan.orderedSqFt, { system: units })} of turf ordered`);
  if (area.plan.wastePct !== undefined)
    parts.push(`${formatNumber(area.plan.wastePct, 1)} % trimmed off`);
  parts.push(`grain toward the ${grainDirectionWords(area.plan.grainAngleDeg)}`);
  return parts.join(' · ');
}

const keyRow = 16;

function keyHeight(area: EstimateDocumentArea): number {
  return Math.ceil(area.plan.pieces.length / 3) * keyRow + keyRow + 8;
}

function writeKey(layout: Layout, area: EstimateDocumentArea, units: Units): void {
  const { doc } = layout;
  const column = layout.width / 3;
  area.plan.pieces.forEach((piece, index) => {
    const x = layout.left + (index % 3) * column;
    const y = layout.y + Math.floor(index / 3) * keyRow;
    const swatch: [number, number][] = [
      [x, y],
      [x + 22, y],
      [x + 22, y + 11],
      [x, y + 11],
    ];
    fillPiece(doc, swatch, pieceFill(index));
    doc.save().lineWidth(0.5).strokeColor(ink.text).rect(x, y, 22, 11).stroke().restore();
    const size = `${formatLength(piece.widthFt, { system: units })} × ${formatLength(piece.lengthFt, { system: units })}`;
    textAt(layout, `Piece ${index + 1}: ${size}`, x + 28, y + 0.5, column - 32, { size: 8.5 });
  });
  layout.y += Math.ceil(area.plan.pieces.length / 3) * keyRow + 2;
  const y = layout.y + 5;
  let x = layout.left;
  const sample = (draw: () => void, label: string): void => {
    draw();
    textAt(layout, label, x + 30, layout.y, 70, { size: 8.5 });
    x += 101;
  };
  sample(
    () =>
      doc
        .save()
        .lineWidth(1.4)
        .dash(6, { space: 3 })
        .moveTo(x, y)
        .lineTo(x + 24, y)
        .stroke()
        .restore(),
    'side seam',
  );
  sample(
    () =>
      doc
        .save()
        .lineWidth(1.8)
        .lineCap('round')
        .dash(0.1, { space: 3.2 })
        .moveTo(x, y)
        .lineTo(x + 24, y)
        .stroke()
        .restore(),
    'butt seam',
  );
  sample(() => grainArrow(doc, [x + 12, y], 0, 22), 'grain direction');
  sample(
    () =>
      doc
        .save()
        .lineWidth(1.8)
        .moveTo(x, y)
        .lineTo(x + 24, y)
        .stroke()
        .restore(),
    'edge of the area',
  );
  if ((area.trafficPaths ?? []).length > 0)
    sample(
      () =>
        drawWalkwayBand(
          doc,
          [
            [x, y],
            [x + 24, y],
          ],
          9,
        ),
      'walkway',
    );
  layout.y += keyRow;
}

/** Height of the drawing at full text width, limited to `maxHeight`. */
function drawingHeight(layout: Layout, area: EstimateDocumentArea, maxHeight: number): number {
  const rings = area.outline ? [area.outline.outer, ...(area.outline.holes ?? [])] : [];
  const points = planPoints(rings, area.plan.cuts, area.trafficPaths ?? []);
  if (points.length === 0) return 0;
  const frame = fitPlan(points, { x: 0, y: 0, width: layout.width, maxHeight: 10_000 }, 26);
  return Math.min(frame.height + 2 * 26 + planFooterHeight, maxHeight);
}

function writeArea(layout: Layout, area: EstimateDocumentArea, units: Units): void {
  const figuresText = figures(area, units);
  const top = 22 + measureText(layout, figuresText, layout.width, { size: 9.5 }) + 6;
  const fullPage = layout.bottom - layout.top - top - keyHeight(area);
  const height = drawingHeight(layout, area, Math.min(fullPage, 470));
  ensureSpace(layout, top + height + keyHeight(area));
  heading(layout, `Plan: ${area.name}`, 0, 13);
  paragraph(layout, figuresText, { size: 9.5, color: ink.muted }, 6);
  layout.y += drawPlan(layout, area, height, units) + 4;
  writeKey(layout, area, units);
  layout.y += 14;
}

export function writePlans(layout: Layout, input: EstimateDocumentInput): void {
  if (input.areas.length === 0) return;
  newPage(layout);
  for (const area of input.areas) writeArea(layout, area, input.units);
}
