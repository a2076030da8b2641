import { describe, expect, it } from "vitest";
import { parseCsvText, regionSides, regionTable } from "../../src/core/index.ts";
import { ecdfSample } from "../../src/worker/ecdfSample.ts";
import { createHandler, transferables } from "../../src/worker/handle.ts";
import type { Answer } from "../../src/worker/protocol.ts";
import { loadText, now } from "./answers.ts";

// id is the row label; x and g differ between the first three rows and the rest; row 6 (record 7) has no x.
const csv = "id,x,g,code\nr1,1,a,007\nr2,2,a,008\nr3,3,a,007\nr4,7,b,009\nr5,8,b,007\nr6,9,a,008\nr7,,b,009\n";
const ignore = (): void => {};

function loadedHandler() {
  const handle = createHandler({ now: () => 0, progressInterval: 0 });
  expect(now(handle(loadText(1, csv), ignore)).type).toBe("loaded");
  return handle;
}

const tabled = (answer: Answer) => {
  if (answer.type !== "regionTabled") throw new Error(`expected a region table, got ${JSON.stringify(answer)}`);
  return answer;
};

describe("worker: region table", () => {
  it("the worker's region table equals core's regionTable for the same sides (A vs rest)", () => {
    const usedRows = Uint32Array.of(0, 1, 2, 3, 4, 5);
    const answer = tabled(now(loadedHandler()({ id: 2, type: "regionTable", rowsRead: 7, usedRows, region: Uint32Array.of(0, 1, 2), versus: null, labelColumn: "id" }, ignore)));
    const expected = regionTable(parseCsvText(csv), regionSides(7, usedRows, Uint32Array.of(0, 1, 2)), { labelColumn: "id" });
    expect(answer.table).toEqual(expected);
    expect(answer.table.rowsUnused).toBe(1); // record 7 is not a used row (worked by hand)
  });

  it("the worker's region table equals core's regionTable for A vs B, with the rows in both counted", () => {
    const usedRows = Uint32Array.of(0, 1, 2, 3, 4, 5, 6);
    const request = { id: 2, type: "regionTable", rowsRead: 7, usedRows, region: Uint32Array.of(0, 1, 2, 3), versus: Uint32Array.of(3, 4, 5), labelColumn: null } as const;
    const answer = tabled(now(loadedHandler()(request, ignore)));
    expect(answer.table).toEqual(regionTable(parseCsvText(csv), regionSides(7, usedRows, request.region, request.versus), { labelColumn: null }));
    expect(answer.table.inBoth).toBe(1); // row 3 is in both regions (worked by hand)
  });

  it("sends each numeric line's sides as ascending present values (x inside: 1, 2, 3; outside: 7, 8, 9; worked by hand)", () => {
    const answer = tabled(now(loadedHandler()({ id: 2, type: "regionTable", rowsRead: 7, usedRows: Uint32Array.of(0, 1, 2, 3, 4, 5, 6), region: Uint32Array.of(0, 1, 2), versus: null, labelColumn: "id" }, ignore)));
    const x = answer.curves.find((c) => c.column === "x")!;
    expect(Array.from(x.inside)).toEqual([1, 2, 3]);
    expect(Array.from(x.outside)).toEqual([7, 8, 9]);
    expect(answer.curves.map((c) => c.column)).toEqual(answer.table.lines.filter((l) => l.kind === "numeric").map((l) => l.column));
    expect(transferables(answer).length).toBe(2 * answer.curves.length);
  });

  it("ecdfSample keeps at most the given number of points: quantiles at 0, 0.5, 1 of 1..5 are 1, 3, 5 (type 7, worked by hand)", () => {
    expect(Array.from(ecdfSample(Float64Array.of(5, 4, 3, 2, 1), Uint32Array.of(0, 1, 2, 3, 4), 3))).toEqual([1, 3, 5]);
    expect(Array.from(ecdfSample(Float64Array.of(3, NaN, 1, 2), Uint32Array.of(0, 1, 2, 3), 2))).toEqual([1, 3]); // the JSDoc example
  });

  it("a region row outside the table fails with the row named", () => {
    const answer = now(loadedHandler()({ id: 2, type: "regionTable", rowsRead: 7, usedRows: Uint32Array.of(0), region: Uint32Array.of(9), versus: null, labelColumn: null }, ignore));
    expect(answer).toEqual({ id: 2, type: "failed", message: "row out of range: 9 (0-based; 7 rows were read)" });
  });
});

describe("worker: region rows", () => {
  const format = { kind: "delimited", delimiter: ",", decimal: ".", delimiterDetected: true, decimalDetected: true } as const;

  it("writes region-rows.csv from the text source with the cells as written (007 stays 007), a row once per region", async () => {
    const answer = await loadedHandler()(
      { id: 3, type: "regionRows", source: { kind: "text", text: csv }, format, encoding: null, regions: [{ name: "A", rows: [0, 4] }, { name: "B", rows: [4] }] },
      ignore,
    );
    expect(answer).toEqual({ id: 3, type: "regionRowsWritten", csv: "region,row,id,x,g,code\nA,1,r1,1,a,007\nA,5,r5,8,b,007\nB,5,r5,8,b,007\n" }); // records 1 and 5 of csv, copied by hand
  });

  it("reads a file source (a Blob) the same way", async () => {
    const answer = await loadedHandler()(
      { id: 3, type: "regionRows", source: { kind: "file", file: new Blob([csv]) }, format, encoding: null, regions: [{ name: "A", rows: [6] }] },
      ignore,
    );
    expect(answer).toEqual({ id: 3, type: "regionRowsWritten", csv: "region,row,id,x,g,code\nA,7,r7,,b,009\n" }); // record 7, copied by hand
  });
});
