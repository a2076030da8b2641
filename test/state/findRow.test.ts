import { describe, expect, it } from "vitest";
import { buildCover, readTableText } from "../../src/core/index.ts";
import { findRow, rowOfQuery } from "../../src/state/findRow.ts";

// Records 1–6: record 3 has a missing y (dropped); under cosine, record 5 = (0, 0) has no direction (undefined).
const csv = "name,x,y\nalpha,1,0\nbeta,1,0.1\ngamma,1,\ndelta,0,1\nepsilon,0,0\nzeta,0.1,1\n";
const table = readTableText(csv).table;
const result = buildCover(table, { features: ["x", "y"], scale: "none", metric: "cosine", radius: 0.01, landmarks: "greedy-file-order", seed: 1, missing: "drop" });

describe("rowOfQuery", () => {
  it("record number 4 is row 3 (1-based outside, 0-based inside)", () => {
    expect(rowOfQuery(table, "name", "4", "record")).toBe(3);
  });
  it("the label delta is row 3", () => {
    expect(rowOfQuery(table, "name", " delta ", "label")).toBe(3);
  });
  it("record 7 of a 6-record table is out of range, and 0 too", () => {
    expect(rowOfQuery(table, "name", "7", "record")).toEqual({ reason: "no record 7: the table has records 1 to 6" });
    expect(rowOfQuery(table, "name", "0", "record")).toEqual({ reason: "no record 0: the table has records 1 to 6" });
  });
  it("0x10, 1e1 and +4 are not record numbers (decimal digits only); ' 4 ' with spaces is record 4", () => {
    expect(rowOfQuery(table, "name", "0x10", "record")).toEqual({ reason: "not a record number: 0x10" });
    expect(rowOfQuery(table, "name", "1e1", "record")).toEqual({ reason: "not a record number: 1e1" });
    expect(rowOfQuery(table, "name", "+4", "record")).toEqual({ reason: "not a record number: +4" });
    expect(rowOfQuery(table, "name", " 4 ", "record")).toBe(3);
  });
  it("2.5 is not a record number", () => {
    expect(rowOfQuery(table, "name", "2.5", "record")).toEqual({ reason: "not a record number: 2.5" });
  });
  it("an unknown label, and a label search with no label column, say so", () => {
    expect(rowOfQuery(table, "name", "omega", "label")).toEqual({ reason: "no row labelled omega in name" });
    expect(rowOfQuery(table, null, "alpha", "label")).toEqual({ reason: "no column has the role row label" });
  });
});

describe("findRow", () => {
  it("alpha (record 1) and beta lie in the same node: cosine distance 1 − 1/√1.01 ≈ 0.005 ≤ 0.01 (worked by hand)", () => {
    const alpha = findRow(table, result, "name", "alpha", "label");
    const beta = findRow(table, result, "name", "2", "record");
    expect(alpha.kind).toBe("found");
    expect(alpha).toEqual({ kind: "found", row: 0, nodes: expect.any(Array) });
    expect(beta.kind === "found" && alpha.kind === "found" && beta.nodes.some((k) => alpha.nodes.includes(k))).toBe(true);
  });
  it("gamma (record 3) is left out for its missing value", () => {
    expect(findRow(table, result, "name", "3", "record")).toEqual({ kind: "left-out", row: 2, reason: "a feature column has a missing value in this row" });
  });
  it("epsilon (record 5, the zero vector) is left out: the cosine distance is undefined", () => {
    expect(findRow(table, result, "name", "epsilon", "label")).toEqual({ kind: "left-out", row: 4, reason: "the cosine distance is undefined for this row" });
  });
  it("record 9 is unknown, with the range", () => {
    expect(findRow(table, result, "name", "9", "record")).toEqual({ kind: "unknown", reason: "no record 9: the table has records 1 to 6" });
  });
});

describe("findRow with a label on several rows", () => {
  const twice = readTableText("name,x\nkappa,1\nlambda,2\nkappa,3\n").table;
  const built = buildCover(twice, { features: ["x"], scale: "none", metric: "euclidean", radius: 0.5, landmarks: "greedy-file-order", seed: 1 });

  it("kappa (records 1 and 3) shows record 1 and says 'label matches 2 rows; showing record 1'", () => {
    expect(findRow(twice, built, "name", "kappa", "label")).toEqual({ kind: "found", row: 0, nodes: [0], note: "label matches 2 rows; showing record 1" }); // node 1 = {record 1}: worked by hand
  });

  it("lambda, on one row, has no note", () => {
    expect(findRow(twice, built, "name", "lambda", "label")).toEqual({ kind: "found", row: 1, nodes: [1] }); // node 2 = {record 2}: worked by hand
  });
});
