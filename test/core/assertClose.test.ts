// Self-test of the shared helper test/assertClose.ts; it lives here because the "node" project
// only collects test/{core,worker,state,cli}, and every numeric test below leans on it.
import { describe, expect, it } from "vitest";
import { assertClose } from "../assertClose.ts";

describe("assertClose", () => {
  it("passes equal numbers and NaN against NaN", () => {
    expect(() => assertClose(1.5, 1.5)).not.toThrow();
    expect(() => assertClose(NaN, NaN)).not.toThrow();
    expect(() => assertClose(Infinity, Infinity)).not.toThrow();
  });

  it("fails NaN against a number, and a number against NaN", () => {
    expect(() => assertClose(NaN, 1)).toThrow(/value: expected 1, got NaN/);
    expect(() => assertClose(1, NaN)).toThrow(/expected NaN, got 1/);
  });

  it("fails -Infinity against Infinity and a finite number against Infinity", () => {
    expect(() => assertClose(-Infinity, Infinity)).toThrow();
    expect(() => assertClose(1e308, Infinity)).toThrow();
  });

  it("uses 1e-12 relative by default: 1 + 1e-13 passes against 1, 1 + 1e-11 fails", () => {
    expect(() => assertClose(1 + 1e-13, 1)).not.toThrow();
    expect(() => assertClose(1 + 1e-11, 1)).toThrow();
  });

  it("with only an absolute tolerance, 0.1 + 0.2 is within 1e-15 of 0.3 but not within 1e-17", () => {
    expect(() => assertClose(0.1 + 0.2, 0.3, { absolute: 1e-15 })).not.toThrow(); // 0.1 + 0.2 − 0.3 = 5.55e-17 (from memory)
    expect(() => assertClose(0.1 + 0.2, 0.3, { absolute: 1e-17 })).toThrow();
  });

  it("with a relative tolerance, 1001 is within 1e-3 of 1000 and 1002 is not", () => {
    expect(() => assertClose(1001, 1000, { relative: 1e-3 })).not.toThrow();
    expect(() => assertClose(1002, 1000, { relative: 1e-3 })).toThrow();
  });

  it("compares typed arrays element by element, also against plain arrays, and names the failing index", () => {
    expect(() => assertClose(Float64Array.of(1, NaN, 3), [1, NaN, 3])).not.toThrow();
    expect(() => assertClose(Uint32Array.of(1, 2), [1, 3])).toThrow(/value\[1\]/);
    expect(() => assertClose([1, 2], [1, 2, 3])).toThrow(/length 3, got 2/);
  });

  it("recurses into objects, requires the same keys and names the failing path", () => {
    expect(() => assertClose({ a: [1, { b: 2 }], c: "x" }, { a: [1, { b: 2 }], c: "x" })).not.toThrow();
    expect(() => assertClose({ a: [1, { b: 2.5 }] }, { a: [1, { b: 2 }] })).toThrow(/value\.a\[1\]\.b/);
    expect(() => assertClose({ a: 1, extra: 2 }, { a: 1 })).toThrow(/keys/);
  });

  it("requires identical strings, booleans and null", () => {
    expect(() => assertClose("a", "a")).not.toThrow();
    expect(() => assertClose("a", "b")).toThrow();
    expect(() => assertClose(null, 0)).toThrow();
    expect(() => assertClose(true, true)).not.toThrow();
  });

  it("rejects a negative tolerance", () => {
    expect(() => assertClose(1, 1, { absolute: -1 })).toThrow(/invalid tolerance/);
  });
});
