/**
 * Ids → their position, for matching thousands of "part.port" references to
 * parts: open addressing with linear probing (Knuth, TAOCP vol. 3, §6.4,
 * algorithm L) over an Int32Array, keyed by the FNV-1a hash of the id's UTF-16
 * units (Fowler–Noll–Vo, IETF draft-eastlake-fnv). A lookup hashes and compares
 * a prefix of the reference in place, so no substring is cut and hashed per
 * pipe end, as a Map keyed by strings needs. A repeated id maps to its last
 * position, as Map.set would, and is flagged (repeats) where it occurs again.
 */

/** FNV-1a, 32 bits, of s[0 .. end). */
function fnv1a(s: string, end: number): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < end; i++) h = Math.imul(h ^ s.charCodeAt(i), 0x01000193);
  return h >>> 0;
}

/** s[0 .. end) equals id. */
function prefixIs(s: string, end: number, id: string): boolean {
  if (id.length !== end) return false;
  for (let i = 0; i < end; i++) if (s.charCodeAt(i) !== id.charCodeAt(i)) return false;
  return true;
}

/** ref[start ..] equals name, compared in place. */
function tailIs(ref: string, start: number, name: string): boolean {
  if (name.length !== ref.length - start) return false;
  for (let c = 0; c < name.length; c++) if (ref.charCodeAt(start + c) !== name.charCodeAt(c)) return false;
  return true;
}

/**
 * The position of the port named ref[start ..] in ports, −1 when none: compared in place, no
 * substring cut (String#endsWith is a runtime call, not compiled inline). The last match, as
 * the model has always taken it.
 */
export function portIndex(ports: readonly string[], ref: string, start: number): number {
  let j = ports.length - 1;
  while (j >= 0 && !tailIs(ref, start, ports[j]!)) j--;
  return j;
}

export class IdIndex {
  /** slot → position + 1 (0: empty) */
  private readonly slots: Int32Array;
  private readonly mask: number;
  /** 1 at each position whose id occurred at an earlier position */
  readonly repeats: Uint8Array;

  constructor(private readonly ids: readonly string[]) {
    let size = 16;
    while (size < 2 * ids.length) size *= 2;
    this.slots = new Int32Array(size);
    this.mask = size - 1;
    this.repeats = new Uint8Array(ids.length);
    for (let i = 0; i < ids.length; i++) {
      const id = ids[i]!;
      let s = fnv1a(id, id.length) & this.mask;
      while (this.slots[s] !== 0 && ids[this.slots[s]! - 1] !== id) s = (s + 1) & this.mask;
      if (this.slots[s] !== 0) this.repeats[i] = 1;
      this.slots[s] = i + 1;
    }
  }

  /** Position of the id equal to ref[0 .. end), −1 when there is none. */
  prefixOf(ref: string, end: number): number {
    for (let s = fnv1a(ref, end) & this.mask; this.slots[s] !== 0; s = (s + 1) & this.mask) {
      const i = this.slots[s]! - 1;
      if (prefixIs(ref, end, this.ids[i]!)) return i;
    }
    return -1;
  }
}
