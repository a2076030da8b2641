// transposeLists: node → item lists in chunks, items possibly renumbered, into row → node lists.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { rowsToNodes, transposeLists } from "../../../src/core/lists/compressedLists.ts";

const listsArbitrary = fc.integer({ min: 1, max: 30 }).chain((rows) =>
  fc.record({
    rows: fc.constant(rows),
    lists: fc.array(fc.uniqueArray(fc.integer({ min: 0, max: rows - 1 }), { maxLength: rows }), { maxLength: 12 }),
    cuts: fc.array(fc.nat(), { maxLength: 4 }),
    shift: fc.nat(),
  }),
);

describe("transposeLists", () => {
  it("the JSDoc example, worked by hand: lists [1, 0] and [0] give row 0 → [0, 1], row 1 → [0]", () => {
    const { offsets, items } = transposeLists([0, 2, 3], [Uint32Array.of(1, 0), Uint32Array.of(0)], 2);
    expect(Array.from(offsets)).toEqual([0, 2, 3]);
    expect(Array.from(items)).toEqual([0, 1, 0]);
  });

  it("equals rowsToNodes of the concatenated, renumbered lists however the items are cut into pieces; twice gives each list sorted", () => {
    fc.assert(
      fc.property(listsArbitrary, ({ rows, lists, cuts, shift }) => {
        const rowOf = Uint32Array.from({ length: rows }, (_, x) => (x + shift) % rows); // a rotation: item x stands for row rowOf[x]
        const offsets = [0];
        for (const list of lists) offsets.push(offsets.at(-1)! + list.length);
        const all = Uint32Array.from(lists.flat());
        const at = [...new Set([0, ...cuts.map((c) => c % (all.length + 1)), all.length])].sort((a, b) => a - b);
        const pieces = at.slice(1).map((end, i) => all.subarray(at[i]!, end));
        const renumbered = { offsets: Uint32Array.from(offsets), items: all.map((x) => rowOf[x]!) };
        const byRow = transposeLists(offsets, pieces, rows, rowOf);
        expect(byRow).toEqual(rowsToNodes(renumbered, rows));
        const back = rowsToNodes(byRow, lists.length);
        expect(Array.from(back.offsets)).toEqual(offsets);
        lists.forEach((list, k) => expect(Array.from(back.items.subarray(offsets[k]!, offsets[k + 1]!))).toEqual(list.map((x) => rowOf[x]!).sort((a, b) => a - b)));
      }),
    );
  });
});
