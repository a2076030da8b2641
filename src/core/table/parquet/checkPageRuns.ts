import type { PageHeader, SchemaElement } from "hyparquet";
import { checkHybridRuns } from "./checkHybridRuns.ts";

/** What checkPageRuns needs to know about the column of a page. */
export interface PageColumn {
  readonly element: SchemaElement;
  /** Decompresses the page's compressed bytes to the given length (the column's codec). */
  readonly decompress: (bytes: Uint8Array, length: number) => Uint8Array;
}

const hybridEncodings = new Set(["PLAIN_DICTIONARY", "RLE_DICTIONARY", "RLE"]);

/**
 * Checks the RLE / bit-packing hybrid streams of one data page of a flat column (its definition
 * levels, dictionary indices or RLE booleans) with checkHybridRuns, laid out as hyparquet reads
 * them: in a DATA_PAGE the levels lead the decompressed body with a 4-byte length; in a
 * DATA_PAGE_V2 they lead the raw body uncompressed, with their lengths in the header; dictionary
 * indices follow a 1-byte bit width and run to the end; RLE values (BOOLEAN in a DATA_PAGE, the
 * RLE encoding in a DATA_PAGE_V2) have a 4-byte length and a bit width of 1.
 * Decompresses the page only when one of those streams is inside its compressed part.
 * Throws on a run that declares more values than the page holds. O(page bytes).
 */
export function checkPageRuns(header: PageHeader, body: Uint8Array, column: PageColumn): void {
  const optional = column.element.repetition_type !== "REQUIRED"; // hyparquet's getMaxDefinitionLevel: one level unless REQUIRED
  const boolean = column.element.type === "BOOLEAN";
  const v1 = header.data_page_header;
  const v2 = header.data_page_header_v2;
  if (v1) {
    const hybrid = hybridEncodings.has(v1.encoding);
    if (!optional && !hybrid) return;
    const page = column.decompress(body, header.uncompressed_page_size);
    const view = new DataView(page.buffer, page.byteOffset, page.byteLength);
    let at = 0;
    if (optional) {
      const length = view.getUint32(at, true);
      checkHybridRuns(view, at + 4, Math.min(page.length, at + 4 + length), 1, v1.num_values);
      at += 4 + length;
    }
    if (hybrid && at < page.length) checkValues(view, at, boolean, v1.num_values);
  } else if (v2) {
    const levels = v2.repetition_levels_byte_length + v2.definition_levels_byte_length;
    const raw = new DataView(body.buffer, body.byteOffset, body.byteLength);
    if (optional) checkHybridRuns(raw, v2.repetition_levels_byte_length, levels, 1, v2.num_values);
    if (!hybridEncodings.has(v2.encoding)) return;
    const length = header.uncompressed_page_size - levels;
    const values = v2.is_compressed === false || length === 0 ? body.subarray(levels) : column.decompress(body.subarray(levels), length);
    if (values.length > 0) checkValues(new DataView(values.buffer, values.byteOffset, values.byteLength), 0, v2.encoding === "RLE", v2.num_values);
  }
}

/** Dictionary indices after a 1-byte bit width, or (prefixed) 1-bit values after a 4-byte length. */
function checkValues(view: DataView, at: number, prefixed: boolean, limit: number): void {
  if (prefixed) return void checkHybridRuns(view, at + 4, Math.min(view.byteLength, at + 4 + view.getUint32(at, true)), 1, limit);
  const bitWidth = view.getUint8(at);
  if (bitWidth > 0) checkHybridRuns(view, at + 1, view.byteLength, bitWidth, limit);
}
