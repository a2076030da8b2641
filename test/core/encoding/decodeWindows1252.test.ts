import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { decodeWindows1252 } from "../../../src/core/encoding/decodeWindows1252.ts";

// Python 3's cp1252 codec, bytes 0x80–0x9F (run when this test was written); the five it leaves
// undefined (0x81, 0x8D, 0x8F, 0x90, 0x9D) are C1 controls in the WHATWG Encoding Standard.
const python = "20AC 0081 201A 0192 201E 2026 2020 2021 02C6 2030 0160 2039 0152 008D 017D 008F 0090 2018 2019 201C 201D 2022 2013 2014 02DC 2122 0161 203A 0153 009D 017E 0178";

describe("decodeWindows1252", () => {
  it("decodes € 1 2 é (JSDoc example)", () => {
    expect(decodeWindows1252(Uint8Array.of(0x80, 0x31, 0x32, 0xe9))).toBe("€12é");
  });

  it("maps 0x80–0x9F as Python 3's cp1252 codec does, and the five unassigned bytes to C1 controls", () => {
    const bytes = Uint8Array.from({ length: 32 }, (_, i) => 0x80 + i);
    const expected = String.fromCharCode(...python.split(" ").map((hex) => parseInt(hex, 16)));
    expect(decodeWindows1252(bytes)).toBe(expected);
  });

  it("every other byte is the Latin-1 code point of the same number", () => {
    const bytes = Uint8Array.from({ length: 256 }, (_, i) => i).filter((b) => b < 0x80 || b > 0x9f);
    expect([...decodeWindows1252(bytes)].map((c) => c.charCodeAt(0))).toEqual(Array.from(bytes));
  });

  it("is stateless: decoding pieces and joining equals decoding the whole", () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 300 }), fc.nat(300), (bytes, cut) => {
        const at = cut % (bytes.length + 1);
        expect(decodeWindows1252(bytes.subarray(0, at)) + decodeWindows1252(bytes.subarray(at))).toBe(decodeWindows1252(bytes));
      }),
    );
  });

  it("decodes more than 8,192 bytes (the String.fromCharCode batch)", () => {
    expect(decodeWindows1252(new Uint8Array(20_000).fill(0x80))).toBe("€".repeat(20_000));
  });
});
