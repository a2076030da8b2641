import type { ParsedTable } from "../core/index.ts";

/**
 * Moves a table's typed arrays into SharedArrayBuffers when the page is cross-origin isolated,
 * so that posting it to the main thread (or to another worker) shares the memory instead of
 * copying it; elsewhere the table is returned unchanged.
 */
export function shareTable(table: ParsedTable): ParsedTable {
  if (typeof SharedArrayBuffer === "undefined" || globalThis.crossOriginIsolated !== true) return table;
  const share = <T extends Float64Array | Uint32Array>(array: T, make: (buffer: SharedArrayBuffer) => T): T => {
    const copy = make(new SharedArrayBuffer(array.byteLength));
    copy.set(array);
    return copy;
  };
  return {
    ...table,
    columns: table.columns.map((column) => ({
      ...column,
      numbers: share(column.numbers, (b) => new Float64Array(b)),
      ...(column.categories ? { categories: { ...column.categories, codes: share(column.categories.codes, (b) => new Uint32Array(b)) } } : {}),
    })),
  };
}
