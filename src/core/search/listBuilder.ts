import type { CompressedLists } from "../graph/ballMembership.ts";

/**
 * Lists appended one after another into fixed-size chunks, then copied once into one buffer.
 * Chunks rather than a doubling buffer: at most the lists twice over (chunks and result) are
 * held at the end, where doubling and trimming can hold three times the lists for a moment.
 */
export interface ListBuilder {
  offsets: number[];
  /** Full chunks, each trimmed to what was written. */
  readonly chunks: Uint32Array[];
  current: Uint32Array;
  /** Values written into `current`, and in all lists so far. */
  used: number;
  size: number;
}

export function createListBuilder(capacity: number): ListBuilder {
  return { offsets: [0], chunks: [], current: new Uint32Array(Math.max(1 << 16, capacity)), used: 0, size: 0 };
}

/** Appends one list. Amortised O(length). */
export function appendList(builder: ListBuilder, list: Uint32Array): void {
  if (builder.used + list.length > builder.current.length) {
    builder.chunks.push(builder.current.subarray(0, builder.used));
    builder.current = new Uint32Array(Math.max(builder.current.length, list.length));
    builder.used = 0;
  }
  builder.current.set(list, builder.used);
  builder.used += list.length;
  builder.size += list.length;
  builder.offsets.push(builder.size);
}

/** The lists' items so far, in order, as views of the chunks (no copy). */
export function listPieces(builder: ListBuilder): Uint32Array[] {
  return [...builder.chunks, builder.current.subarray(0, builder.used)];
}

/** The lists so far, as compressed lists with their own buffers. O(total length). */
export function finishLists(builder: ListBuilder): CompressedLists {
  const items = new Uint32Array(builder.size);
  let at = 0;
  for (const chunk of listPieces(builder)) {
    items.set(chunk, at);
    at += chunk.length;
  }
  return { offsets: Uint32Array.from(builder.offsets), items };
}
