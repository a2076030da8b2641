import { transposeLists, type CompressedLists } from "./compressedLists.ts";
import { createPackedStore, packList, transposePacked, unpackLists, type PackedStore } from "./packedLists.ts";

/**
 * Lists appended one after another into fixed-size chunks, then copied once into one buffer.
 * Chunks rather than a doubling buffer: at most the lists twice over (chunks and result) are
 * held at the end, where doubling and trimming can hold three times the lists for a moment.
 * A packed builder (for ascending lists) stores them as varint gaps instead (packedLists.ts),
 * about a quarter of the bytes for balls in tree order; it is read by transposeBuilt or finishLists.
 */
export interface ListBuilder {
  offsets: number[];
  /** Full chunks, each trimmed to what was written. */
  readonly chunks: Uint32Array[];
  current: Uint32Array;
  /** Values per chunk; a room wider than that gets a chunk of its own size. */
  readonly chunkSize: number;
  /** Values written into `current`, and in all lists so far. */
  used: number;
  size: number;
  /** The lists as varint gaps, for a packed builder (chunks and current then stay empty); else null. */
  readonly packed: PackedStore | null;
}

/** A builder whose chunks hold `capacity` values, between 2¹⁶ and 2¹⁸ (a room wider than that gets a chunk of its own size). */
export function createListBuilder(capacity: number, options: { readonly packed?: boolean } = {}): ListBuilder {
  if (options.packed) return { offsets: [0], chunks: [], current: new Uint32Array(0), chunkSize: 0, used: 0, size: 0, packed: createPackedStore() };
  const chunkSize = Math.min(1 << 18, Math.max(1 << 16, capacity));
  return { offsets: [0], chunks: [], current: new Uint32Array(chunkSize), chunkSize, used: 0, size: 0, packed: null };
}

/** Appends one list. Amortised O(length). */
export function appendList(builder: ListBuilder, list: Uint32Array): void {
  if (builder.packed) {
    packList(builder.packed, list);
    builder.size += list.length;
    builder.offsets.push(builder.size);
    return;
  }
  reserveLists(builder, list.length).set(list);
  closeLists(builder, [list.length]);
}

/**
 * Room for lists of `total` values in all, written by the caller straight into the returned view
 * and then closed by `closeLists` with their lengths: saves a staging copy of the lists.
 */
export function reserveLists(builder: ListBuilder, total: number): Uint32Array {
  const { packed } = builder;
  if (packed) {
    if (packed.room.length < total) packed.room = new Uint32Array(Math.max(total, 2 * packed.room.length));
    return packed.room.subarray(0, total);
  }
  if (builder.used + total > builder.current.length) {
    builder.chunks.push(builder.current.subarray(0, builder.used));
    builder.current = new Uint32Array(Math.max(builder.chunkSize, total));
    builder.used = 0;
  }
  return builder.current.subarray(builder.used, builder.used + total);
}

/** Closes lists written into the last reserved room: `ends[l]` is the end of list l in it (ends ascending, the last one the total). */
export function closeLists(builder: ListBuilder, ends: ArrayLike<number>): void {
  const total = ends.length > 0 ? ends[ends.length - 1]! : 0;
  const { packed } = builder;
  if (packed) for (let l = 0, start = 0; l < ends.length; start = ends[l++]!) packList(packed, packed.room.subarray(start, ends[l]!));
  else builder.used += total;
  for (let l = 0; l < ends.length; ++l) builder.offsets.push(builder.size + ends[l]!);
  builder.size += total;
}

/** The lists' items so far, in order, as views of the chunks (no copy). */
export function listPieces(builder: ListBuilder): Uint32Array[] {
  if (builder.packed) throw new Error("a packed builder has no plain pieces");
  return [...builder.chunks, builder.current.subarray(0, builder.used)];
}

/** The lists so far, as compressed lists with their own buffers. O(total length). */
export function finishLists(builder: ListBuilder): CompressedLists {
  if (builder.packed) return unpackLists(builder.offsets, builder.packed);
  const items = new Uint32Array(builder.size);
  let at = 0;
  for (const chunk of listPieces(builder)) {
    items.set(chunk, at);
    at += chunk.length;
  }
  return { offsets: Uint32Array.from(builder.offsets), items };
}

/**
 * transposeLists of the builder's lists, item x standing for row rowOf[x]; packed lists are read
 * without unpacking, into `spare` when it fits (transposePacked). O(total + rows).
 */
export function transposeBuilt(builder: ListBuilder, rows: number, rowOf: Uint32Array, spare?: ArrayBufferLike): CompressedLists {
  return builder.packed ? transposePacked(builder.offsets, builder.packed, rows, rowOf, spare) : transposeLists(builder.offsets, listPieces(builder), rows, rowOf);
}
