import fc from "fast-check";
import type { NumericTable } from "../../../src/core/index.ts";

/**
 * Random small tables for property tests: 1..60 rows, 1..5 columns, values k/2 for k in −6..6.
 * Halves are exact in binary and so are their squared differences and sums, so distances can be
 * compared with r² exactly, and a coarse grid makes duplicate rows and ties d = r common.
 */
export const gridTable: fc.Arbitrary<NumericTable> = fc
  .record({ rows: fc.integer({ min: 1, max: 60 }), columns: fc.integer({ min: 1, max: 5 }) })
  .chain(({ rows, columns }) =>
    fc.array(fc.integer({ min: -6, max: 6 }), { minLength: rows * columns, maxLength: rows * columns }).map(
      (cells): NumericTable => ({
        rows,
        columns,
        names: Array.from({ length: columns }, (_, j) => `c${j + 1}`),
        values: Float64Array.from(cells, (k) => k / 2),
      }),
    ),
  );

/** Radii on the same half grid, 0.5..4. */
export const gridRadius: fc.Arbitrary<number> = fc.integer({ min: 1, max: 8 }).map((k) => k / 2);

/** Landmark rule of a build: file order, or an order shuffled by a seed. */
export const landmarkRule: fc.Arbitrary<{ rule: "greedy-file-order" | "greedy-shuffled"; seed: number }> = fc.record({
  rule: fc.constantFrom("greedy-file-order" as const, "greedy-shuffled" as const),
  seed: fc.integer({ min: -1000, max: 1000 }),
});
