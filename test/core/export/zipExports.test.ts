import { describe, expect, it } from "vitest";
import { strFromU8, unzipSync } from "fflate";
import { zipExports, type CoverExports } from "../../../src/core/index.ts";

const files: CoverExports = Object.freeze({
  "nodes.csv": "node,landmark_row,size\n1,1,2\n",
  "members.csv": "node,row,id\n1,1,caf\u00e9\n1,2,'=x\n",
  "edges.csv": "source,target,shared\n",
  "summary.json": '{\n  "nodes": 1\n}\n',
});

describe("zipExports", () => {
  it("unzips (fflate unzipSync) to the same four texts, UTF-8 included", () => {
    const entries = unzipSync(zipExports(files));
    expect(Object.keys(entries).sort()).toEqual(["edges.csv", "members.csv", "nodes.csv", "summary.json"]);
    for (const [name, text] of Object.entries(files)) expect(strFromU8(entries[name]!)).toBe(text);
  });

  it("is byte-identical on two calls (fixed timestamp)", () => {
    expect(Array.from(zipExports(files))).toEqual(Array.from(zipExports(files)));
  });

  it("starts with the local file header signature PK\\x03\\x04", () => {
    expect(Array.from(zipExports(files).subarray(0, 4))).toEqual([0x50, 0x4b, 0x03, 0x04]); // zip format (PKWARE APPNOTE), from memory
  });
});
