// The page and the cursor every section writes at. pdfkit's own margins are zero so it never
// breaks a page by itself; sections ask `ensureSpace` first and the page breaks only between
// blocks we chose, never inside a table row or a caution.
import PDFDocument from 'pdfkit';
import { documentFontData, documentFonts } from './document-fonts.js';
import type { DocumentFont } from './document-fonts.js';

/** US Letter, in points (72 per inch). */
export const pageSize = { width: 612, height: 792 } as const;
const margin = { top: 54, side: 54, bottom: 64 } as const;

/**
 * Every colour is a grey or near-black, so a black-and-white print keeps every distinction;
 * the one accent (moss) prints as a dark grey and never carries meaning alone.
 */
export const ink = {
  text: '#1c2228',
  muted: '#4a545e',
  rule: '#8a949e',
  faint: '#c9cfd5',
  shade: '#eceff1',
  accent: '#2f5d3a',
} as const;

export interface Layout {
  readonly doc: PDFKit.PDFDocument;
  /** The cursor: where the next block starts. */
  y: number;
  readonly left: number;
  readonly right: number;
  readonly width: number;
  readonly top: number;
  readonly bottom: number;
}

export function createLayout(title: string, author: string): Layout {
  const doc = new PDFDocument({
    size: [pageSize.width, pageSize.height],
    margin: 0,
    bufferPages: true,
    info: { Title: title, Author: author, Creator: 'Seamwright' },
    lang: 'en-US',
  });
  for (const font of Object.keys(documentFonts) as DocumentFont[])
    doc.registerFont(font, documentFontData(font));
  doc.font('regular');
  return {
    doc,
    y: margin.top,
    left: margin.side,
    right: pageSize.width - margin.side,
    width: pageSize.width - 2 * margin.side,
    top: margin.top,
    bottom: pageSize.height - margin.bottom,
  };
}

export function newPage(layout: Layout): void {
  layout.doc.addPage({ size: [pageSize.width, pageSize.height], margin: 0 });
  layout.y = layout.top;
}

/** Starts a new page when `height` points do not fit under the cursor. */
export function ensureSpace(layout: Layout, height: number): void {
  if (layout.y + height > layout.bottom) newPage(layout);
}

export interface TextStyle {
  font?: DocumentFont;
  size?: number;
  color?: string;
  align?: 'left' | 'right' | 'center';
  lineGap?: number;
}

/** Numbers line up in columns: tabular figures (Source Sans 3 has `tnum`). */
const features: PDFKit.Mixins.OpenTypeFeatures[] = ['kern', 'liga', 'tnum'];

function applyStyle(doc: PDFKit.PDFDocument, style: TextStyle): PDFKit.Mixins.TextOptions {
  doc
    .font(style.font ?? 'regular')
    .fontSize(style.size ?? 10)
    .fillColor(style.color ?? ink.text);
  return { align: style.align ?? 'left', lineGap: style.lineGap ?? 1.5, features };
}

/** Height `text` takes when wrapped to `width`. */
export function measureText(layout: Layout, text: string, width: number, style: TextStyle = {}) {
  const options = applyStyle(layout.doc, style);
  return layout.doc.heightOfString(text, { ...options, width });
}

/** Writes text at (x, y) wrapped to `width`, without moving the cursor; returns its height. */
export function textAt(
  layout: Layout,
  text: string,
  x: number,
  y: number,
  width: number,
  style: TextStyle = {},
): number {
  const options = applyStyle(layout.doc, style);
  const height = layout.doc.heightOfString(text, { ...options, width });
  layout.doc.text(text, x, y, { ...options, width });
  return height;
}

/** Writes a paragraph across the text width at the cursor (a new page first when it does not fit). */
export function paragraph(layout: Layout, text: string, style: TextStyle = {}, gapAfter = 4): void {
  const height = measureText(layout, text, layout.width, style);
  ensureSpace(layout, height);
  textAt(layout, text, layout.left, layout.y, layout.width, style);
  layout.y += height + gapAfter;
}

/** A section heading, kept on the same page as at least `keepWith` points of what follows. */
export function heading(layout: Layout, text: string, keepWith = 60, size = 13): void {
  const height = measureText(layout, text, layout.width, { font: 'bold', size });
  ensureSpace(layout, height + keepWith);
  textAt(layout, text, layout.left, layout.y, layout.width, { font: 'bold', size });
  layout.y += height + 4;
}

/** A thin horizontal rule across the text width at the cursor. */
export function rule(layout: Layout, color: string = ink.rule, weight = 0.6, gap = 8): void {
  const { doc } = layout;
  doc
    .save()
    .moveTo(layout.left, layout.y)
    .lineTo(layout.right, layout.y)
    .lineWidth(weight)
    .strokeColor(color)
    .stroke()
    .restore();
  layout.y += gap;
}
