import { appendList, closeLists, reserveLists, type ListBuilder } from "../../../../src/core/lists/listBuilder.ts";

/** Writes one group of lists into `builder` through reserved room (reserveLists, closeLists), and appends each to `reference` one by one. */
export function writeGroup(builder: ListBuilder, reference: ListBuilder, lists: readonly ArrayLike<number>[]): void {
  const room = reserveLists(builder, lists.reduce((sum, list) => sum + list.length, 0));
  const ends: number[] = [];
  let at = 0;
  for (const list of lists) {
    room.set(list, at);
    at += list.length;
    ends.push(at);
    appendList(reference, Uint32Array.from(list));
  }
  closeLists(builder, ends);
}
