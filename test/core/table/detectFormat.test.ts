import { describe, expect, it } from "vitest";
import { detectDecimalMark, detectDelimiter } from "../../../src/core/table/detectFormat.ts";

describe("detectDelimiter", () => {
  it("picks ';' for a decimal-comma table: the header splits in two and so does every record (JSDoc example)", () => {
    expect(detectDelimiter("a;b\n1,5;2\n3,5;4\n", true)).toBe(";");
  });

  it("ignores delimiters inside quotes", () => {
    expect(detectDelimiter('name;x\n"Smith, J";1\n"Doe, K";2\n', true)).toBe(";");
  });

  it("a single column with commas in its text is not split by ',': ';' splits no record and is first of the ties", () => {
    expect(detectDelimiter("name\nSmith, J\nDoe\n", true)).toBe(";");
  });

  it("prefers the candidate whose width most records share: tab over a comma that appears in some cells", () => {
    expect(detectDelimiter("a\tb\n1,2\t3\n4\t5\n", true)).toBe("\t");
  });

  it("ties go to the wider split, then to the order , ; tab |", () => {
    expect(detectDelimiter("a,b;c\n1,2;3\n", true)).toBe(",");
    expect(detectDelimiter("a;b;c|d\n1;2;3|4\n", true)).toBe(";");
  });

  it("uses only complete records of a partial sample: a cut last line does not count", () => {
    expect(detectDelimiter("a;b\n1;2\n3;4\n5", false)).toBe(";");
    expect(detectDelimiter("a;b\n1;2\n3,4,5,6,7", false)).toBe(";");
  });

  it("an empty sample gives ','", () => {
    expect(detectDelimiter("", true)).toBe(",");
  });
});

describe("detectDecimalMark", () => {
  it("reads ',' when '12,5'-like cells outnumber '12.5'-like ones (JSDoc example)", () => {
    expect(detectDecimalMark("a;b\n1,5;2\n", ";", true)).toBe(",");
  });

  it("reads '.' when points are at least as many, and always with ',' between fields", () => {
    expect(detectDecimalMark("a;b\n1,5;2.5\n", ";", true)).toBe(".");
    expect(detectDecimalMark('a,b\n"1,5","2,5"\n', ",", true)).toBe(".");
  });

  it("integers alone say nothing: '.'", () => {
    expect(detectDecimalMark("a\tb\n1\t2\n", "\t", true)).toBe(".");
  });
});
