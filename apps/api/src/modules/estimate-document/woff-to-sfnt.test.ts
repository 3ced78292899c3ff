// The unpacked font is checked against the checksums the WOFF file itself carries for every
// table (OpenType spec, "Calculating checksums"): an independent check of the inflating.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { documentFontPath } from './document-fonts.js';
import { woffToSfnt } from './woff-to-sfnt.js';

function tableChecksum(data: Buffer): number {
  let sum = 0;
  for (let at = 0; at < data.length; at += 4) {
    const word = Buffer.alloc(4);
    data.copy(word, 0, at, Math.min(at + 4, data.length));
    sum = (sum + word.readUInt32BE(0)) >>> 0;
  }
  return sum;
}

describe('woffToSfnt', () => {
  it('unpacks every table of the shipped font to its recorded checksum', () => {
    const woff = readFileSync(documentFontPath('regular'));
    const sfnt = woffToSfnt(woff);
    expect(sfnt.readUInt32BE(0)).toBe(woff.readUInt32BE(4)); // the flavor (TrueType or CFF)
    const count = sfnt.readUInt16BE(4);
    expect(count).toBe(woff.readUInt16BE(12));
    for (let i = 0; i < count; i += 1) {
      const entry = 12 + i * 16;
      const tag = sfnt.subarray(entry, entry + 4).toString('latin1');
      const offset = sfnt.readUInt32BE(entry + 8);
      const data = Buffer.from(sfnt.subarray(offset, offset + sfnt.readUInt32BE(entry + 12)));
      // The head table's checksum is taken with its checkSumAdjustment field (bytes 8–11) as 0.
      if (tag === 'head') data.writeUInt32BE(0, 8);
      expect(tableChecksum(data), tag).toBe(sfnt.readUInt32BE(entry + 4));
    }
  });

  it('leaves a buffer that is not WOFF alone', () => {
    const other = Buffer.from('not a font');
    expect(woffToSfnt(other)).toBe(other);
  });
});
