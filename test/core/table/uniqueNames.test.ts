import { describe, expect, it } from "vitest";
import { uniqueNames } from "../../../src/core/table/uniqueNames.ts";

describe("uniqueNames", () => {
  it("names an empty cell column_j and suffixes repeats _2, _3 (JSDoc example)", () => {
    expect(uniqueNames(["a", "a", ""]).names).toEqual(["a", "a_2", "column_3"]);
  });

  it("trims names and skips a suffix already taken", () => {
    expect(uniqueNames([" a ", "a_2", "a", "a"]).names).toEqual(["a", "a_2", "a_3", "a_4"]);
  });

  it("gives one notice per changed name and none for a trimmed one", () => {
    expect(uniqueNames([" x ", "x", " "]).notices).toEqual([
      { code: "renamed-column", message: 'column 2 repeats the name "x": renamed it x_2' },
      { code: "renamed-column", message: "column 3 has no name: called it column_3" },
    ]);
  });
});
