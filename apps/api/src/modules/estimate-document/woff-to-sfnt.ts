// WOFF 1.0 → the plain TrueType/OpenType font inside it. fontkit reads WOFF itself, but it
// inflates the tables with a pure-JavaScript inflater on every table read of every document
// (seconds per document in our measurement); node:zlib does it once per thread instead.
// Format: W3C "WOFF File Format 1.0" (header §3, table directory §4, compressed data §5).
import { inflateSync } from 'node:zlib';

const woffSignature = 0x774f4646; // 'wOFF'
const woffHeaderSize = 44;
const woffEntrySize = 20;
const sfntEntrySize = 16;

interface Table {
  tag: number;
  checksum: number;
  data: Buffer;
}

function readTables(woff: Buffer, count: number): Table[] {
  const tables: Table[] = [];
  for (let i = 0; i < count; i += 1) {
    const at = woffHeaderSize + i * woffEntrySize;
    const offset = woff.readUInt32BE(at + 4);
    const compLength = woff.readUInt32BE(at + 8);
    const origLength = woff.readUInt32BE(at + 12);
    const stored = woff.subarray(offset, offset + compLength);
    // A table is stored as is when compressing would not make it smaller (§5).
    const data = compLength < origLength ? inflateSync(stored) : Buffer.from(stored);
    if (data.length !== origLength)
      throw new Error('WOFF table length does not match its directory');
    tables.push({ tag: woff.readUInt32BE(at), checksum: woff.readUInt32BE(at + 16), data });
  }
  return tables;
}

/** The font as a TrueType/OpenType file; a buffer that is not WOFF 1.0 comes back unchanged. */
export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.length < woffHeaderSize || woff.readUInt32BE(0) !== woffSignature) return woff;
  const flavor = woff.readUInt32BE(4);
  const count = woff.readUInt16BE(12);
  const tables = readTables(woff, count);
  const log2 = Math.floor(Math.log2(count));
  const searchRange = 2 ** log2 * 16;
  const headerSize = 12 + count * sfntEntrySize;
  const padded = (length: number): number => (length + 3) & ~3;
  const size = tables.reduce((sum, table) => sum + padded(table.data.length), headerSize);
  const sfnt = Buffer.alloc(size);
  sfnt.writeUInt32BE(flavor, 0);
  sfnt.writeUInt16BE(count, 4);
  sfnt.writeUInt16BE(searchRange, 6);
  sfnt.writeUInt16BE(log2, 8);
  sfnt.writeUInt16BE(count * 16 - searchRange, 10);
  let offset = headerSize;
  // The WOFF directory is sorted by tag (§4), as the font's own table directory must be.
  tables.forEach((table, i) => {
    const entry = 12 + i * sfntEntrySize;
    sfnt.writeUInt32BE(table.tag, entry);
    sfnt.writeUInt32BE(table.checksum, entry + 4);
    sfnt.writeUInt32BE(offset, entry + 8);
    sfnt.writeUInt32BE(table.data.length, entry + 12);
    table.data.copy(sfnt, offset);
    offset += padded(table.data.length);
  });
  return sfnt;
}
