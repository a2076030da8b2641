/**
 * Text made safe for XML 1.0 element content and for attribute values in either quote style.
 * Escapes & < > " ' as the five predefined entities, and tab, line feed and carriage return as
 * numeric character references (&#9; &#10; &#13;), so that a parser's end-of-line handling and
 * attribute-value normalisation (XML 1.0, sections 2.11 and 3.3.3) give back the very text written.
 * Characters that XML 1.0 forbids outright (production [2] Char: the C0 controls other than tab,
 * line feed and carriage return, lone UTF-16 surrogates, U+FFFE and U+FFFF) cannot be written even
 * as references, so each is replaced by U+FFFD, the replacement character; nothing is ever refused.
 * Source: W3C, Extensible Markup Language (XML) 1.0, Fifth Edition, 2008, sections 2.2 and 2.4.
 * O(length of text).
 * @example escapeXml(`a<b&c"d`) // => "a&lt;b&amp;c&quot;d"
 */
export function escapeXml(text: string): string {
  let out = "";
  let from = 0;
  for (let i = 0; i < text.length; ++i) {
    const code = text.charCodeAt(i);
    let replacement = replacements[text[i]!];
    if (replacement === undefined) {
      if (code >= 0xd800 && code <= 0xdbff && isLowSurrogate(text.charCodeAt(i + 1))) {
        ++i; // a well-formed pair is one allowed character beyond U+FFFF
        continue;
      }
      if (!(code < 0x20 || (code >= 0xd800 && code <= 0xdfff) || code === 0xfffe || code === 0xffff)) continue;
      replacement = "\ufffd";
    }
    out += text.slice(from, i) + replacement;
    from = i + 1;
  }
  return from === 0 ? text : out + text.slice(from);
}

function isLowSurrogate(code: number): boolean {
  return code >= 0xdc00 && code <= 0xdfff;
}

const replacements: Readonly<Record<string, string>> = {
  "&": "&amp;",
  "<": "&lt;",
  ">": "&gt;",
  '"': "&quot;",
  "'": "&apos;",
  "\t": "&#9;",
  "\n": "&#10;",
  "\r": "&#13;",
};
