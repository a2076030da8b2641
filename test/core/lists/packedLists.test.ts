// Packed lists (varint gaps, unsigned LEB128 as in the DWARF standard, version 5, section 7.6,
// the section number from memory): they must read back exactly as written, and their
// transposition must equal transposeLists of the plain lists.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { transposeLists } from "../../../src/core/lists/compressedLists.ts";
import { appendList, createListBuilder, finishLists, transposeBuilt } from "../../../src/core/lists/listBuilder.ts";
import { createPackedStore, packList, packedPieces } from "../../../src/core/lists/packedLists.ts";
import { writeGroup } from "../search/support/listGroups.ts";

/** Ascending lists with small gaps (one byte), large ones (up to five bytes) and values up to 2³² − 1. */
const ascendingList = fc
  .array(fc.oneof(fc.integer({ min: 0, max: 3 }), fc.integer({ min: 0, max: 300 }), fc.integer({ min: 0, max: 2 ** 31 })), { maxLength: 40 })
  .map((gaps) => {
    const out: number[] = [];
    let value = 0;
    for (const gap of gaps) {
      if (value + gap > 2 ** 32 - 1) break;
      value += gap;
      out.push(value);
    }
    return Uint32Array.from(out);
  });

describe("packed lists", () => {
  it("worked by hand: [0, 1, 129, 2³² − 1] packs to the gaps 0, 1, 128, 2³² − 130 in 1 + 1 + 2 + 5 bytes", () => {
    const store = createPackedStore();
    packList(store, Uint32Array.of(0, 1, 129, 2 ** 32 - 1));
    const bytes = Array.from(packedPieces(store).at(-1)!);
    // 128 = 0b1_0000000 → 0x80 0x01; 2³² − 130 = 0xFFFFFF7E → 0xFE 0xFE 0xFF 0xFF 0x0F
    expect(bytes).toEqual([0x00, 0x01, 0x80, 0x01, 0xfe, 0xfe, 0xff, 0xff, 0x0f]);
  });

  it("read back exactly as written, through appendList or reserved room, empty lists and chunk ends included", () => {
    // one list long enough to need a chunk of its own (over 2²⁰ bytes at five bytes a value), sometimes
    const long = Uint32Array.from({ length: 250_000 }, (_, i) => i * 4096);
    const same = (a: Uint32Array, b: Uint32Array): boolean => a.length === b.length && a.every((x, i) => x === b[i]);
    fc.assert(
      fc.property(fc.array(fc.array(ascendingList, { maxLength: 5 }), { maxLength: 6 }), fc.nat(6), (groups, longAt) => {
        const packed = createListBuilder(0, { packed: true });
        const plain = createListBuilder(0);
        groups.forEach((lists, g) => {
          if (g === longAt) {
            appendList(packed, long);
            appendList(plain, long);
          }
          writeGroup(packed, plain, lists);
        });
        const got = finishLists(packed);
        const expected = finishLists(plain);
        expect(same(got.offsets, expected.offsets) && same(got.items, expected.items)).toBe(true);
      }),
      { numRuns: 40 },
    );
  });

  it("transposed without unpacking equals transposeLists of the plain lists, in a spare buffer or not", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 40 }).chain((rows) =>
          fc.record({
            rows: fc.constant(rows),
            lists: fc.array(fc.uniqueArray(fc.integer({ min: 0, max: rows - 1 }), { maxLength: rows }).map((xs) => Uint32Array.from(xs.sort((a, b) => a - b))), { maxLength: 10 }),
            shift: fc.nat(),
            spareShare: fc.constantFrom(0, 1, 1.5, 3), // the spare buffer's size as a share of what the result needs
          }),
        ),
        ({ rows, lists, shift, spareShare }) => {
          const rowOf = Uint32Array.from({ length: rows }, (_, x) => (x + shift) % rows);
          const packed = createListBuilder(0, { packed: true });
          for (const list of lists) appendList(packed, list);
          const offsets = [0];
          for (const list of lists) offsets.push(offsets.at(-1)! + list.length);
          const expected = transposeLists(offsets, lists, rows, rowOf);
          const need = 4 * (rows + 1 + offsets.at(-1)!);
          const spareBytes = 8 * Math.ceil((spareShare * need) / 8);
          const spare = new ArrayBuffer(spareBytes);
          new Float64Array(spare).fill(Math.PI); // stale contents must not leak into the counts
          const got = transposeBuilt(packed, rows, rowOf, spare);
          expect(Array.from(got.offsets)).toEqual(Array.from(expected.offsets));
          expect(Array.from(got.items)).toEqual(Array.from(expected.items));
          // used when the result fits and fills at least half of it
          expect(got.items.buffer === spare).toBe(need <= spareBytes && 2 * need >= spareBytes);
        },
      ),
    );
  });

  it("keeps a chunk with much room left as an exact copy, so its unused space does not stay alive", () => {
    const store = createPackedStore();
    packList(store, Uint32Array.from({ length: 1000 }, (_, i) => i)); // 1,000 one-byte gaps
    packList(store, Uint32Array.from({ length: 300_000 }, (_, i) => i)); // too long for the room left: a chunk of its own
    packList(store, Uint32Array.of(7)); // fits in the rest of that chunk (5 bytes a value reserved)
    const pieces = packedPieces(store);
    expect(pieces.map((p) => p.length)).toEqual([1000, 300_001]);
    expect(pieces[0]!.buffer.byteLength).toBe(1000); // the full chunk: an exact copy, not a view of 2²⁰ bytes
  });

  it("keeps a nearly full chunk as it is (no copy)", () => {
    const store = createPackedStore();
    const list = Uint32Array.from({ length: 1000 }, (_, i) => i); // 1,000 bytes, 5,000 reserved
    for (let k = 0; k < 1100; ++k) packList(store, list); // 2²⁰ bytes hold 1,044 lists with room for the worst case
    const first = packedPieces(store)[0]!;
    expect(first.length).toBeGreaterThanOrEqual(0.875 * 2 ** 20);
    expect(first.buffer.byteLength).toBe(2 ** 20);
  });

  it("refuses a list that descends", () => {
    expect(() => packList(createPackedStore(), Uint32Array.of(3, 2))).toThrow("packed lists must ascend: 2 after 3");
  });
});
