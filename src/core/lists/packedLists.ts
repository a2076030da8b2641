import type { CompressedLists } from "./compressedLists.ts";

/**
 * Ascending lists of integers below 2³² stored as gaps (the first value, then each value minus
 * the one before) in LEB128 varints: 7 bits a byte, the high bit set on every byte but the last.
 * Balls in tree order are runs of neighbouring positions, so most gaps take one byte instead of
 * four. Each list is written whole into one chunk; a full chunk is kept as it is when at least
 * 7/8 used, else as an exact copy of its bytes (a list longer than a chunk's room gets a chunk of
 * its own, often far from full).
 * Source of the varint: the unsigned LEB128 encoding of the DWARF debugging standard (version 5,
 * section 7.6 "Variable Length Data"; the section number from memory).
 */
export interface PackedStore {
  readonly chunks: Uint8Array[];
  current: Uint8Array;
  used: number;
  /** Scratch for lists written before they are packed (reserveLists of a packed builder). */
  room: Uint32Array;
}

const chunkBytes = 1 << 20;

export function createPackedStore(): PackedStore {
  return { chunks: [], current: new Uint8Array(chunkBytes), used: 0, room: new Uint32Array(0) };
}

/** Appends one ascending list (values may repeat, never decrease). O(length). */
export function packList(store: PackedStore, list: Uint32Array): void {
  const worst = 5 * list.length;
  if (store.used + worst > store.current.length) {
    // a view of a nearly full chunk; a copy of a chunk with much room left (a long ball reserves
    // five bytes a value and often uses one or two), since a view would keep the whole of it alive
    if (store.used >= 0.875 * store.current.length) store.chunks.push(store.current.subarray(0, store.used));
    else if (store.used > 0) store.chunks.push(store.current.slice(0, store.used));
    store.current = new Uint8Array(Math.max(chunkBytes, worst));
    store.used = 0;
  }
  const bytes = store.current;
  let at = store.used;
  let previous = 0;
  for (let t = 0; t < list.length; ++t) {
    const value = list[t]!;
    if (value < previous) throw new Error(`packed lists must ascend: ${value} after ${previous}`);
    let gap = value - previous;
    previous = value;
    while (gap >= 0x80) {
      bytes[at++] = (gap & 0x7f) | 0x80;
      gap >>>= 7;
    }
    bytes[at++] = gap;
  }
  store.used = at;
}

/** The store's bytes in order, as views (no copy). */
export function packedPieces(store: PackedStore): Uint8Array[] {
  return [...store.chunks, store.current.subarray(0, store.used)];
}

/**
 * Decodes every list in order (list k holds items offsets[k]..offsets[k+1]−1 of the concatenation),
 * item by item, and does one of three things with each value: without rowOf, items[at] = value
 * (unpack); with rowOf and no items, counts[rowOf[value] + 1]++ (count); with both,
 * items[counts[rowOf[value]]++] = k (place). One loop for all three: a call per membership would
 * be slow where the engine does not inline it. O(bytes).
 */
function decode(offsets: readonly number[], store: PackedStore, items: Uint32Array | null, counts: Uint32Array | null, rowOf: Uint32Array | null): void {
  let k = 0;
  let at = 0;
  for (const bytes of packedPieces(store)) {
    let b = 0;
    while (b < bytes.length) {
      while (at >= offsets[k + 1]!) ++k; // lists with no items have no bytes
      let value = 0;
      for (const end = offsets[k + 1]!; at < end; ++at) {
        let byte = bytes[b++]!;
        let gap = byte & 0x7f;
        // gaps below 2⁷ take one byte (the usual case); longer ones add 7 bits a byte (≤ 5 bytes, < 2³²)
        for (let shift = 128; byte & 0x80; shift *= 128) {
          byte = bytes[b++]!;
          gap += (byte & 0x7f) * shift;
        }
        value += gap;
        if (!rowOf) items![at] = value;
        else if (!items) counts![rowOf[value]! + 1]!++;
        else items[counts![rowOf[value]!]!++] = k;
      }
    }
  }
}

/** Every list unpacked into one array. O(total). */
export function unpackLists(offsets: readonly number[], store: PackedStore): CompressedLists {
  const items = new Uint32Array(offsets[offsets.length - 1] ?? 0);
  decode(offsets, store, items, null, null);
  return { offsets: Uint32Array.from(offsets), items };
}

/**
 * transposeLists (graph/ballMembership.ts) of packed lists, without unpacking them first: for
 * each of `rows` rows the lists holding it, ascending; item x stands for row rowOf[x]. Two passes
 * over the bytes (count, then place). With `spare`, a buffer nothing else reads any more, the
 * result is placed at its start when it fits and fills at least half of it, so that its memory is
 * reused instead of left for the collector. O(bytes + rows).
 */
export function transposePacked(offsets: readonly number[], store: PackedStore, rows: number, rowOf: Uint32Array, spare?: ArrayBufferLike): CompressedLists {
  const total = offsets[offsets.length - 1] ?? 0;
  const bytes = 4 * (rows + 1 + total);
  // reuse only a buffer the result fills at least half of: otherwise holding the rest for the
  // remaining steps would cost more than the buffer the result needs
  const fits = spare !== undefined && bytes <= spare.byteLength && 2 * bytes >= spare.byteLength;
  const counts = fits ? new Uint32Array(spare, 0, rows + 1).fill(0) : new Uint32Array(rows + 1);
  decode(offsets, store, null, counts, rowOf);
  for (let i = 0; i < rows; ++i) counts[i + 1]! += counts[i]!;
  const items = fits ? new Uint32Array(spare, 4 * (rows + 1), total) : new Uint32Array(total);
  decode(offsets, store, items, counts.slice(0, rows), rowOf);
  return { offsets: counts, items };
}
