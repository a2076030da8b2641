// @vitest-environment jsdom
// jsdom for its strict XML parser (DOMParser with application/xml); the code under test is pure
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { escapeXml } from "../../../src/core/export/escapeXml.ts";

/** Parses `<r a="…">…</r>` with jsdom's strict XML parser and gives back the attribute and the text. */
function roundTrip(text: string): { attribute: string | null; content: string | null } {
  const escaped = escapeXml(text);
  const document = new DOMParser().parseFromString(`<r a="${escaped}" b='${escaped}'>${escaped}</r>`, "application/xml");
  expect(document.getElementsByTagName("parsererror").length).toBe(0);
  const root = document.documentElement;
  expect(root.getAttribute("b")).toBe(root.getAttribute("a"));
  return { attribute: root.getAttribute("a"), content: root.textContent };
}

describe("escapeXml", () => {
  it('writes a<b&c"d as a&lt;b&amp;c&quot;d (the five predefined entities, XML 1.0 section 4.6)', () => {
    expect(escapeXml(`a<b&c"d`)).toBe("a&lt;b&amp;c&quot;d");
    expect(escapeXml("it's > 1")).toBe("it&apos;s &gt; 1");
  });

  it('a<b&c"d round-trips exactly through an XML parser, in content and in both attribute quote styles', () => {
    expect(roundTrip(`a<b&c"d`)).toEqual({ attribute: `a<b&c"d`, content: `a<b&c"d` });
  });

  it("tab, line feed and carriage return become character references and round-trip exactly (no end-of-line or attribute normalisation)", () => {
    expect(escapeXml("a\tb\nc\r\nd")).toBe("a&#9;b&#10;c&#13;&#10;d");
    expect(roundTrip("a\tb\nc\r\nd")).toEqual({ attribute: "a\tb\nc\r\nd", content: "a\tb\nc\r\nd" });
  });

  it("characters XML 1.0 forbids (NUL, other C0 controls, U+FFFE, U+FFFF, lone surrogates) become U+FFFD", () => {
    expect(escapeXml("a\u0000b\u0008c\u000bd\u001fe")).toBe("a\ufffdb\ufffdc\ufffdd\ufffde");
    expect(escapeXml("\ufffe\uffff")).toBe("\ufffd\ufffd");
    expect(escapeXml("x\ud800y\udc00z")).toBe("x\ufffdy\ufffdz");
  });

  it("keeps a surrogate pair (U+1F41F) and other allowed text as it is", () => {
    expect(escapeXml("fish \ud83d\udc1f, é, ε-net, U+007F \u007f")).toBe("fish \ud83d\udc1f, é, ε-net, U+007F \u007f");
  });

  it("round-trips any string free of forbidden characters exactly (property)", () => {
    fc.assert(
      fc.property(fc.string({ unit: "grapheme" }), (text) => {
        fc.pre(escapeXml(text).split("\ufffd").length === text.split("\ufffd").length); // nothing forbidden was replaced
        expect(roundTrip(text)).toEqual({ attribute: text, content: text });
      }),
      { numRuns: 200 },
    );
  });
});
