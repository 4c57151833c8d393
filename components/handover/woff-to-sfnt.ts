import { inflateSync } from "node:zlib";

// A WOFF 1.0 font unpacked to the plain TrueType/OpenType (sfnt) it wraps, following the W3C
// WOFF File Format 1.0 recommendation (§3 header, §4 table directory, §5 table data: each
// table zlib-compressed unless its compressed length equals its original length). Done once
// per process with Node's native zlib: fontkit would inflate the tables in JavaScript for
// every PDF, which is most of a report's time.

export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.readUInt32BE(0) !== 0x774f4646) throw new Error("not a WOFF file");
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables = Array.from({ length: numTables }, (_, i) => {
    const at = 44 + i * 20;
    return { tag: woff.readUInt32BE(at), offset: woff.readUInt32BE(at + 4), compLength: woff.readUInt32BE(at + 8),
      origLength: woff.readUInt32BE(at + 12), checksum: woff.readUInt32BE(at + 16) };
  });
  const data = tables.map((t) => {
    const raw = woff.subarray(t.offset, t.offset + t.compLength);
    return t.compLength < t.origLength ? inflateSync(raw) : raw;
  });
  // sfnt header: version, numTables, searchRange, entrySelector, rangeShift (OpenType spec, "Table directory")
  const pow = 2 ** Math.floor(Math.log2(numTables));
  const head = Buffer.alloc(12 + 16 * numTables);
  head.writeUInt32BE(flavor, 0);
  head.writeUInt16BE(numTables, 4);
  head.writeUInt16BE(pow * 16, 6);
  head.writeUInt16BE(Math.log2(pow), 8);
  head.writeUInt16BE(numTables * 16 - pow * 16, 10);
  const bodies: Buffer[] = [];
  let offset = head.length;
  tables.forEach((t, i) => {
    const at = 12 + i * 16;
    head.writeUInt32BE(t.tag, at);
    head.writeUInt32BE(t.checksum, at + 4);
    head.writeUInt32BE(offset, at + 8);
    head.writeUInt32BE(t.origLength, at + 12);
    const padded = Buffer.alloc((data[i]!.length + 3) & ~3);
    data[i]!.copy(padded);
    bodies.push(padded);
    offset += padded.length;
  });
  return Buffer.concat([head, ...bodies]);
}
