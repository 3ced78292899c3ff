// The document's fonts ship with the app: Source Sans 3 from npm (@fontsource/source-sans-3,
// SIL Open Font License), from the package's WOFF files. Paths are resolved through the
// package, never as machine paths; each file is read and unpacked once per thread.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { woffToSfnt } from './woff-to-sfnt.js';

const require = createRequire(import.meta.url);

/** The faces the document uses, by the name pdfkit registers them under. */
export const documentFonts = {
  regular: 'source-sans-3-latin-400-normal',
  italic: 'source-sans-3-latin-400-italic',
  semibold: 'source-sans-3-latin-600-normal',
  bold: 'source-sans-3-latin-700-normal',
} as const;

export type DocumentFont = keyof typeof documentFonts;

const loaded = new Map<DocumentFont, Buffer>();

/** The path of one face's WOFF file inside the installed package. */
export function documentFontPath(font: DocumentFont): string {
  return require.resolve(`@fontsource/source-sans-3/files/${documentFonts[font]}.woff`);
}

/** One face as a TrueType/OpenType font (unpacked from its WOFF file on first use). */
export function documentFontData(font: DocumentFont): Buffer {
  let data = loaded.get(font);
  if (!data) {
    data = woffToSfnt(readFileSync(documentFontPath(font)));
    loaded.set(font, data);
  }
  return data;
}
