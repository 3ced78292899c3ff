// Reads a PDF's text back with pdf-parse (pdf.js underneath), an extractor we do not write
// ourselves, so the tests check what a reader of the file really gets.
import { PDFParse } from 'pdf-parse';

export interface PdfText {
  /** Each page's text, whitespace (line breaks from wrapping, column gaps) folded to one space. */
  pages: string[];
  /** All pages, folded the same way. */
  text: string;
}

export function fold(text: string): string {
  return text.replace(/\s+/g, ' ').trim();
}

export async function pdfText(pdf: Buffer): Promise<PdfText> {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    const result = await parser.getText();
    const pages = result.pages.map((page) => fold(page.text));
    return { pages, text: pages.join(' ') };
  } finally {
    await parser.destroy();
  }
}

/** Dollars as any reader would write them, from whole cents (an independent formatter). */
export function dollars(cents: number): string {
  return (cents / 100).toLocaleString('en-US', { style: 'currency', currency: 'USD' });
}
