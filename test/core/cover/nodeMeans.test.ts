import { describe, expect, it } from "vitest";
import { nodeMeans, nodeMembers, randomSource } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

describe("nodeMeans", () => {
  it("the JSDoc example: column 1, 3, NaN over nodes {0, 1} and {2} gives 2 and NaN", () => {
    const means = nodeMeans(Float64Array.of(1, 3, NaN), { offsets: Uint32Array.of(0, 2, 3), items: Uint32Array.of(0, 1, 2) });
    assertClose(means, [2, NaN]); // worked by hand
  });

  it("skips missing values and counts a row in every node it belongs to", () => {
    // Node 0 = rows {0, 1, 2}: (10 + 20) / 2 = 15 (row 2 missing); node 1 = rows {1, 3}: (20 + 50) / 2 = 35.
    const means = nodeMeans(Float64Array.of(10, 20, NaN, 50), { offsets: Uint32Array.of(0, 3, 5), items: Uint32Array.of(0, 1, 2, 1, 3) });
    assertClose(means, [15, 35]); // worked by hand
  });

  it("an empty node gives NaN and no nodes give an empty array", () => {
    assertClose(nodeMeans(Float64Array.of(1), { offsets: Uint32Array.of(0, 0), items: new Uint32Array(0) }), [NaN]);
    expect(nodeMeans(Float64Array.of(1), { offsets: Uint32Array.of(0), items: new Uint32Array(0) }).length).toBe(0);
  });
});

/** The plain loop, node by node in list order: the reference the blocked pass must match bit for bit. */
function plainMeans(column: Float64Array, offsets: Uint32Array, items: Uint32Array): number[] {
  const means: number[] = [];
  for (let k = 0; k + 1 < offsets.length; ++k) {
    let sum = 0;
    let count = 0;
    for (let t = offsets[k]!; t < offsets[k + 1]!; ++t) {
      const x = column[items[t]!]!;
      if (Number.isNaN(x)) continue;
      sum += x;
      count++;
    }
    means.push(count === 0 ? NaN : sum / count);
  }
  return means;
}

describe("nodeMeans on a column longer than one block (100,000 rows)", () => {
  const random = randomSource(5);
  const rows = 100_000;
  const column = Float64Array.from({ length: rows }, () => (random() < 0.01 ? NaN : (random() - 0.5) * 1e6));
  const lists: number[][] = Array.from({ length: 40 }, () => []);
  for (let row = 0; row < rows; ++row) for (const list of lists) if (random() < 0.05) list.push(row);
  lists.push([]); // an empty node
  const offsets = Uint32Array.from([0, ...lists.map((_, k) => lists.slice(0, k + 1).reduce((n, l) => n + l.length, 0))]);

  it("ascending lists (the blocked pass) give the plain loop's means bit for bit", () => {
    const items = Uint32Array.from(lists.flat());
    expect(Array.from(nodeMeans(column, { offsets, items }))).toEqual(plainMeans(column, offsets, items)); // toEqual compares with Object.is: the same doubles
  });

  it("a list out of order (the plain pass) gives the plain loop's means too", () => {
    const items = Uint32Array.from(lists.flatMap((list, k) => (k === 3 ? [...list].reverse() : list)));
    expect(Array.from(nodeMeans(column, { offsets, items }))).toEqual(plainMeans(column, offsets, items));
  });
});

describe("nodeMembers", () => {
  it("returns node k's rows as a view into the lists", () => {
    const members = { offsets: Uint32Array.of(0, 2, 5), items: Uint32Array.of(0, 1, 1, 2, 3) };
    expect(Array.from(nodeMembers(members, 1))).toEqual([1, 2, 3]);
    expect(nodeMembers(members, 1).buffer).toBe(members.items.buffer);
  });
});
