// listBuilder: lists appended into chunks and copied once must read back as their concatenation.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { appendList, createListBuilder, finishLists } from "../../../src/core/lists/listBuilder.ts";
import { writeGroup } from "../search/support/listGroups.ts";

describe("listBuilder", () => {
  it("gives the offsets and items of the plain concatenation, lists longer than a chunk included", () => {
    fc.assert(
      fc.property(fc.array(fc.array(fc.nat(1000), { maxLength: 70_000 }).map((xs) => Uint32Array.from(xs)), { maxLength: 6 }), (lists) => {
        const builder = createListBuilder(0); // chunks of 65,536 values
        for (const list of lists) appendList(builder, list);
        const { offsets, items } = finishLists(builder);
        const expectedOffsets = [0];
        for (const list of lists) expectedOffsets.push(expectedOffsets.at(-1)! + list.length);
        expect(Array.from(offsets)).toEqual(expectedOffsets);
        expect(items).toEqual(Uint32Array.from(lists.flatMap((list) => Array.from(list))));
      }),
      { numRuns: 30 },
    );
  });
  it("handles no lists and empty lists", () => {
    const builder = createListBuilder(4);
    appendList(builder, new Uint32Array(0));
    expect(finishLists(builder)).toEqual({ offsets: Uint32Array.of(0, 0), items: new Uint32Array(0) });
    expect(finishLists(createListBuilder(4))).toEqual({ offsets: Uint32Array.of(0), items: new Uint32Array(0) });
  });
});

describe("listBuilder reserved room", () => {
  it("lists written into reserved room read back like appended ones, across chunk boundaries", () => {
    fc.assert(
      fc.property(fc.array(fc.array(fc.array(fc.nat(1000), { maxLength: 30_000 }), { maxLength: 4 }), { maxLength: 6 }), (groups) => {
        const reserved = createListBuilder(0);
        const appended = createListBuilder(0);
        for (const lists of groups) writeGroup(reserved, appended, lists);
        expect(finishLists(reserved)).toEqual(finishLists(appended));
      }),
      { numRuns: 30 },
    );
  });
});
