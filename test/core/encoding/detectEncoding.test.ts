import { describe, expect, it } from "vitest";
import { detectEncoding, maybeEncoding } from "../../../src/core/encoding/detectEncoding.ts";
import { looksBinary } from "../../../src/core/encoding/looksBinary.ts";

const bytes = (text: string): Uint8Array => new TextEncoder().encode(text);

describe("detectEncoding", () => {
  it("a UTF-8 byte-order mark: utf-8, 3 bytes to skip", () => {
    expect(detectEncoding(Uint8Array.of(0xef, 0xbb, 0xbf, 0x61))).toEqual({ encoding: "utf-8", bomLength: 3 });
  });

  it("ASCII and well-formed UTF-8 without a mark: utf-8", () => {
    expect(detectEncoding(bytes("x,y\n1,2\n"))).toEqual({ encoding: "utf-8", bomLength: 0 });
    expect(detectEncoding(bytes("town;°C\nKöln;12,5\n"))).toEqual({ encoding: "utf-8", bomLength: 0 });
  });

  it("a byte 0x80 that UTF-8 cannot start with: windows-1252 (JSDoc example)", () => {
    expect(detectEncoding(Uint8Array.of(0x61, 0x3b, 0x80))).toEqual({ encoding: "windows-1252", bomLength: 0 });
  });

  it("a head cut inside a UTF-8 sequence stays utf-8, unless it is the whole file", () => {
    const cut = Uint8Array.of(0x61, 0xc3);
    expect(detectEncoding(cut).encoding).toBe("utf-8");
    expect(detectEncoding(cut, true).encoding).toBe("windows-1252");
  });

  it("throws for UTF-16 and UTF-32 marks, NUL bytes and an empty head", () => {
    expect(() => detectEncoding(Uint8Array.of(0xff, 0xfe, 0x61, 0x00))).toThrow("utf-16 and utf-32 text are not supported: save the file as utf-8");
    expect(() => detectEncoding(Uint8Array.of(0xfe, 0xff, 0x00, 0x61))).toThrow("utf-16 and utf-32 text are not supported");
    expect(() => detectEncoding(Uint8Array.of(0x50, 0x4b, 0x03, 0x04, 0x00))).toThrow("this looks like a binary file: it has NUL bytes in its first 1 KiB");
    expect(() => detectEncoding(new Uint8Array(0))).toThrow("the file is empty");
  });
});

describe("looksBinary", () => {
  it("finds a NUL byte in the first 1 KiB (JSDoc example) and ignores one after it", () => {
    expect(looksBinary(Uint8Array.of(0x50, 0x4b, 0x03, 0x04, 0x00))).toBe(true);
    const late = new Uint8Array(2048).fill(0x61);
    late[1500] = 0;
    expect(looksBinary(late)).toBe(false);
  });
});

describe("maybeEncoding", () => {
  it.each([
    ["UTF-8", "utf-8"],
    ["utf8", "utf-8"],
    ["cp1252", "windows-1252"],
    ["Windows-1252", "windows-1252"],
  ])("normalises %j to %j", (name, encoding) => {
    expect(maybeEncoding(name)).toBe(encoding);
  });

  it("throws for an encoding Shoal does not read", () => {
    expect(() => maybeEncoding("latin-9")).toThrow('invalid encoding: "latin-9"');
  });
});
