import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { isValidUtf8 } from "../../../src/core/encoding/isValidUtf8.ts";

const fatal = new TextDecoder("utf-8", { fatal: true });
const decodes = (bytes: Uint8Array): boolean => {
  try {
    fatal.decode(bytes);
    return true;
  } catch {
    return false;
  }
};

describe("isValidUtf8", () => {
  it("accepts 'café' in UTF-8 (JSDoc example)", () => {
    expect(isValidUtf8(Uint8Array.of(0x63, 0x61, 0x66, 0xc3, 0xa9))).toBe(true);
  });

  it.each([
    ["a lone continuation byte", [0x80]],
    ["Windows-1252 é", [0x63, 0x61, 0x66, 0xe9]],
    ["an overlong '/'", [0xc0, 0xaf]],
    ["an overlong three-byte form", [0xe0, 0x80, 0xaf]],
    ["a surrogate U+D800", [0xed, 0xa0, 0x80]],
    ["a code point above U+10FFFF", [0xf4, 0x90, 0x80, 0x80]],
    ["0xFF", [0xff]],
  ])("rejects %s (Unicode 15, Table 3-7)", (_, bytes) => {
    expect(isValidUtf8(Uint8Array.from(bytes))).toBe(false);
  });

  it("a sequence cut by the end is valid only as a prefix", () => {
    const cut = Uint8Array.of(0x61, 0xe2, 0x82); // "a" and the first two bytes of €
    expect(isValidUtf8(cut)).toBe(false);
    expect(isValidUtf8(cut, true)).toBe(true);
  });

  it("agrees with a fatal TextDecoder on random bytes and on encoded random strings", () => {
    // Bytes drawn evenly from ASCII, continuation bytes and lead bytes, so that valid sequences occur often.
    const byte = fc.oneof(fc.integer({ min: 0, max: 0x7f }), fc.integer({ min: 0x80, max: 0xbf }), fc.integer({ min: 0xc0, max: 0xff }));
    const random = fc.array(byte, { maxLength: 24 }).map((b) => Uint8Array.from(b));
    fc.assert(fc.property(random, (bytes) => isValidUtf8(bytes) === decodes(bytes)), { numRuns: 5000 });
    fc.assert(fc.property(fc.string({ unit: "grapheme" }), (text) => isValidUtf8(new TextEncoder().encode(text))));
  });
});
