import fc from "fast-check";
import { metrics, type Metric, type MetricName, type NumericTable } from "../../../../src/core/index.ts";

/**
 * Random tables made to break pruning: small integers (squared distances are exact integers, so
 * integer radii give exact ties d = r), near-ties such as 0.1 + 0.2 next to 0.3, duplicate rows
 * (rows drawn from a small pool), constant columns, zero rows (cosine undefined) and constant
 * rows (correlation undefined), tiny and huge magnitudes, and one-row tables.
 */
const nearTies = [0.1, 0.2, 0.3, 0.1 + 0.2, 1 / 3, 2 / 3, 0.7, 1 - 1e-16, 1 + 2 ** -52];
const cellValue: fc.Arbitrary<number> = fc.oneof(
  { weight: 6, arbitrary: fc.integer({ min: -3, max: 3 }) },
  { weight: 2, arbitrary: fc.constantFrom(...nearTies) },
  { weight: 2, arbitrary: fc.double({ min: -4, max: 4, noNaN: true, noDefaultInfinity: true }) },
);

export interface SearchCase {
  readonly table: NumericTable;
  readonly metric: Metric;
  readonly radius: number;
  /** Rows per leaf of the k-d tree: small leaves make deep trees even on small tables. */
  readonly leafSize: number;
}

export const tableArbitrary: fc.Arbitrary<NumericTable> = fc
  .record({
    rows: fc.integer({ min: 1, max: 90 }),
    columns: fc.integer({ min: 1, max: 6 }),
    pool: fc.integer({ min: 1, max: 90 }),
    constantColumn: fc.boolean(),
    scale: fc.constantFrom(1, 1, 1, 1e-150, 1e150),
  })
  .chain(({ rows, columns, pool, constantColumn, scale }) =>
    fc
      .record({
        cells: fc.array(cellValue, { minLength: pool * columns, maxLength: pool * columns }),
        picks: fc.array(fc.integer({ min: 0, max: pool - 1 }), { minLength: rows, maxLength: rows }),
      })
      .map(({ cells, picks }): NumericTable => {
        const values = new Float64Array(rows * columns);
        picks.forEach((p, i) => {
          for (let k = 0; k < columns; ++k) values[i * columns + k] = (constantColumn && k === 0 ? 1 : cells[p * columns + k]!) * scale;
        });
        return { rows, columns, names: Array.from({ length: columns }, (_, k) => `c${k + 1}`), values };
      }),
  );

/** Radii with exact ties on the integer grid (1, 2, 3, …), near-ties, tiny and large values. */
export const radiusArbitrary: fc.Arbitrary<number> = fc.oneof(
  fc.integer({ min: 1, max: 6 }),
  fc.constantFrom(0.1 + 0.2, 0.3, Math.SQRT2, 0.5, 1e-9, 1 - Math.SQRT1_2, 2 - 1e-15),
  fc.double({ min: 1e-3, max: 8, noNaN: true }),
);

export const metricArbitrary: fc.Arbitrary<Metric> = fc.constantFrom(...(Object.keys(metrics) as MetricName[])).map((name) => metrics[name]);

/**
 * A table, metric, leaf size and radius; half the radii are the metric's own computed distance
 * between two rows of the table, so that the predicate meets d = r exactly for that pair.
 */
export const searchCase: fc.Arbitrary<SearchCase> = fc
  .record({ table: tableArbitrary, metric: metricArbitrary, leafSize: fc.constantFrom(1, 2, 3, 5, 32), a: fc.nat(), b: fc.nat(), tie: fc.boolean(), radius: radiusArbitrary })
  .map(({ table, metric, leafSize, a, b, tie, radius }) => {
    const distance = metric.distance(table.values, table.columns, a % table.rows, b % table.rows);
    return { table, metric, leafSize, radius: tie && distance > 0 && Number.isFinite(distance) ? distance : radius };
  });
