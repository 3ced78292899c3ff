// How each roll piece is told apart in print: a grey tone and a hatch direction together, so
// neighbouring pieces differ even on a black-and-white copy where close greys merge.
import { ink } from './document-layout.js';
import type { PagePoint } from './plan-frame.js';

export interface PieceFill {
  readonly grey: string;
  /** Hatch angles in degrees on the page (0 = horizontal); none for a plain tone. */
  readonly hatch: readonly number[];
}

const fills: readonly PieceFill[] = [
  { grey: '#dfe3e7', hatch: [] },
  { grey: '#f7f8f9', hatch: [45] },
  { grey: '#bcc4cc', hatch: [] },
  { grey: '#f7f8f9', hatch: [-45] },
  { grey: '#e9ecef', hatch: [0] },
  { grey: '#f7f8f9', hatch: [45, -45] },
  { grey: '#d0d6dc', hatch: [90] },
];

export function pieceFill(piece: number): PieceFill {
  return fills[piece % fills.length] ?? { grey: '#e9ecef', hatch: [] };
}

const hatchSpacing = 4.5;

/** Path of a closed polygon on the page (not stroked or filled yet). */
export function polygonPath(doc: PDFKit.PDFDocument, points: readonly PagePoint[]): void {
  points.forEach(([x, y], index) => (index === 0 ? doc.moveTo(x, y) : doc.lineTo(x, y)));
  doc.closePath();
}

/** Fills `polygon` with the piece's tone and hatch (at `opacity`), clipped to the polygon. */
export function fillPiece(
  doc: PDFKit.PDFDocument,
  polygon: readonly PagePoint[],
  fill: PieceFill,
  opacity = 1,
): void {
  doc.save();
  polygonPath(doc, polygon);
  doc.fillOpacity(opacity).fill(fill.grey);
  doc.restore();
  if (fill.hatch.length === 0) return;
  const xs = polygon.map(([x]) => x);
  const ys = polygon.map(([, y]) => y);
  const cx = (Math.min(...xs) + Math.max(...xs)) / 2;
  const cy = (Math.min(...ys) + Math.max(...ys)) / 2;
  const radius = Math.hypot(Math.max(...xs) - cx, Math.max(...ys) - cy) + hatchSpacing;
  doc.save();
  polygonPath(doc, polygon);
  doc.clip();
  doc.strokeOpacity(opacity).lineWidth(0.45).strokeColor(ink.muted);
  for (const angle of fill.hatch) {
    const rad = (angle * Math.PI) / 180;
    const [dx, dy] = [Math.cos(rad), Math.sin(rad)];
    for (let t = -radius; t <= radius; t += hatchSpacing) {
      const [ox, oy] = [cx - dy * t, cy + dx * t];
      doc.moveTo(ox - dx * radius, oy - dy * radius).lineTo(ox + dx * radius, oy + dy * radius);
    }
    doc.stroke();
  }
  doc.restore();
}
