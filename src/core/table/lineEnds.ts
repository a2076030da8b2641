export interface LineEnds {
  /** The chunk with "\r\n" and "\r" turned into "\n" (a final "\r" waits for the next chunk). */
  push(chunk: string): string;
  /** Whatever was held back, at the end of the text. */
  flush(): string;
}

/**
 * Streaming line-end normaliser: drops a byte-order mark at the very start and turns every
 * "\r\n" and lone "\r" into "\n", also inside quoted fields, so that files with mixed line ends
 * read the same and any chunking of the text gives the same output. O(chunk length).
 * @example lineEnds().push("\ufeffa\r\nb\rc") // => "a\nb\nc"
 */
export function lineEnds(): LineEnds {
  let started = false;
  let heldCarriageReturn = false;
  return {
    push(chunk) {
      if (chunk === "") return "";
      let text = heldCarriageReturn ? `\r${chunk}` : chunk;
      if (!started) {
        started = true;
        if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
      }
      heldCarriageReturn = text.endsWith("\r");
      if (heldCarriageReturn) text = text.slice(0, -1);
      return text.includes("\r") ? text.replace(/\r\n?/g, "\n") : text;
    },
    flush() {
      const rest = heldCarriageReturn ? "\n" : "";
      heldCarriageReturn = false;
      return rest;
    },
  };
}
