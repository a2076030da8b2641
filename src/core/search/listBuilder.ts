import type { CompressedLists } from "../graph/ballMembership.ts";

/** Lists appended one after another into a growing buffer, then frozen as compressed lists. */
export interface ListBuilder {
  offsets: number[];
  items: Uint32Array;
  size: number;
}

export function createListBuilder(capacity: number): ListBuilder {
  return { offsets: [0], items: new Uint32Array(Math.max(16, capacity)), size: 0 };
}

/** Appends one list; the buffer doubles when full. Amortised O(length). */
export function appendList(builder: ListBuilder, list: Uint32Array): void {
  const needed = builder.size + list.length;
  if (needed > builder.items.length) {
    const grown = new Uint32Array(Math.max(needed, 2 * builder.items.length));
    grown.set(builder.items.subarray(0, builder.size));
    builder.items = grown;
  }
  builder.items.set(list, builder.size);
  builder.size = needed;
  builder.offsets.push(needed);
}

/** The lists so far, as compressed lists with their own buffers. O(total length). */
export function finishLists(builder: ListBuilder): CompressedLists {
  return { offsets: Uint32Array.from(builder.offsets), items: builder.items.slice(0, builder.size) };
}
