/**
 * Test support: finds every integer in a Parquet file's footer and page headers (Thrift compact
 * protocol, as the Apache Parquet format specification prescribes) and rewrites the file with some
 * of them changed or some page bodies replaced, moving every byte offset the footer holds so that
 * the rest of the file still lines up. The fuzz test uses it to make files whose declared sizes lie
 * in a controlled way, and to make GZIP and uncompressed copies of the Snappy fixture.
 */

/** One integer field: its path of field ids and list indices, its bytes, its value. */
export interface IntField {
  readonly path: string; // "3" is FileMetaData.num_rows; "4.0.1.2.3.4" is the codec of row group 0, column 2
  readonly start: number; // absolute byte offsets in the file
  readonly end: number;
  readonly value: bigint;
}

export interface Page {
  readonly chunk: ColumnChunkLayout;
  readonly headerStart: number;
  readonly bodyStart: number;
  readonly bodyEnd: number;
  readonly fields: IntField[]; // "2" uncompressed size, "3" compressed size, "5.1"/"7.1"/"8.1" value counts
}

export interface ColumnChunkLayout {
  readonly metaPath: string; // path of its ColumnMetaData, e.g. "4.0.1.2.3"
  readonly start: number;
  readonly end: number;
}

export interface ParquetLayout {
  readonly bytes: Uint8Array;
  readonly footerStart: number;
  readonly footer: IntField[];
  readonly chunks: ColumnChunkLayout[];
  readonly pages: Page[];
}

/** A replacement of bytes [start, end) before the footer. */
export interface Edit {
  readonly start: number;
  readonly end: number;
  readonly bytes: Uint8Array;
}

class Cursor {
  constructor(
    readonly bytes: Uint8Array,
    public offset: number,
  ) {}
  byte(): number {
    if (this.offset >= this.bytes.length) throw new Error("thrift: out of bytes");
    return this.bytes[this.offset++]!;
  }
  varint(): bigint {
    let result = 0n;
    for (let shift = 0n; ; shift += 7n) {
      const b = this.byte();
      result |= BigInt(b & 0x7f) << shift;
      if (!(b & 0x80)) return result;
    }
  }
}

const unzigzag = (n: bigint): bigint => (n >> 1n) ^ -(n & 1n);

/** Zigzag varint bytes of a Thrift compact integer. */
export function compactInt(value: bigint): Uint8Array {
  let n = value >= 0n ? value << 1n : (-value << 1n) - 1n;
  const out: number[] = [];
  do {
    const low = Number(n & 0x7fn);
    n >>= 7n;
    out.push(n ? low | 0x80 : low);
  } while (n);
  return Uint8Array.from(out);
}

function readStruct(c: Cursor, path: string, out: IntField[]): void {
  let lastId = 0;
  for (;;) {
    const head = c.byte();
    if (head === 0) return;
    const delta = head >> 4;
    const id = delta ? lastId + delta : Number(unzigzag(c.varint()));
    lastId = id;
    readValue(c, head & 0x0f, path ? `${path}.${id}` : String(id), out);
  }
}

function readValue(c: Cursor, type: number, path: string, out: IntField[]): void {
  if (type === 1 || type === 2) return; // a boolean field carries its value in the header
  if (type === 3) return void c.byte();
  if (type === 4 || type === 5 || type === 6) {
    const start = c.offset;
    const value = unzigzag(c.varint());
    return void out.push({ path, start, end: c.offset, value });
  }
  if (type === 7) return void (c.offset += 8);
  if (type === 8) {
    const length = Number(c.varint()); // read before the offset it moves
    return void (c.offset += length);
  }
  if (type === 9 || type === 10) {
    const head = c.byte();
    const size = head >> 4 === 15 ? Number(c.varint()) : head >> 4;
    for (let i = 0; i < size; ++i) {
      if ((head & 15) === 1 || (head & 15) === 2) c.byte();
      else readValue(c, head & 15, `${path}.${i}`, out);
    }
    return;
  }
  if (type === 11) {
    const size = Number(c.varint());
    const kinds = size > 0 ? c.byte() : 0;
    for (let i = 0; i < size; ++i) {
      readValue(c, kinds >> 4, `${path}.${i}k`, out);
      readValue(c, kinds & 15, `${path}.${i}v`, out);
    }
    return;
  }
  if (type === 12) return readStruct(c, path, out);
  throw new Error(`thrift: unknown type ${type} at ${path} (byte ${c.offset})`);
}

const field = (fields: IntField[], path: string): IntField | undefined => fields.find((f) => f.path === path);

/** Reads the footer and every page header of a well-formed file. */
export function parquetLayout(bytes: Uint8Array): ParquetLayout {
  const n = bytes.length;
  const footerLength = new DataView(bytes.buffer, bytes.byteOffset, n).getUint32(n - 8, true);
  const footerStart = n - 8 - footerLength;
  const footer: IntField[] = [];
  readStruct(new Cursor(bytes, footerStart), "", footer);
  const chunks: ColumnChunkLayout[] = [];
  const pages: Page[] = [];
  for (const f of footer) {
    if (!/^4\.\d+\.1\.\d+\.3\.9$/.test(f.path)) continue;
    const metaPath = f.path.slice(0, -2);
    const start = Number(field(footer, `${metaPath}.11`)?.value || f.value);
    const chunk = { metaPath, start, end: start + Number(field(footer, `${metaPath}.7`)!.value) };
    chunks.push(chunk);
    for (let at = chunk.start; at < chunk.end; ) {
      const fields: IntField[] = [];
      const c = new Cursor(bytes, at);
      readStruct(c, "", fields);
      const bodyEnd = c.offset + Number(field(fields, "3")!.value);
      pages.push({ chunk, headerStart: at, bodyStart: c.offset, bodyEnd, fields });
      at = bodyEnd;
    }
  }
  return { bytes, footerStart, footer, chunks, pages };
}

const offsetPaths = [/^4\.\d+\.1\.\d+\.3\.(9|10|11)$/, /^4\.\d+\.1\.\d+\.(2|4|6)$/, /^4\.\d+\.5$/]; // page, chunk and row group offsets

/**
 * The file with `edits` applied before the footer and the footer's integers at `footerValues`
 * (path → value); offsets past an edit move with it and a chunk's sizes grow with edits inside it.
 */
export function rewriteParquet(layout: ParquetLayout, edits: readonly Edit[], footerValues: ReadonlyMap<string, bigint> = new Map()): Uint8Array {
  const values = new Map(layout.footer.map((f) => [f.path, f.value]));
  for (const edit of edits) {
    const growth = BigInt(edit.bytes.length - (edit.end - edit.start));
    for (const f of layout.footer) if (offsetPaths.some((p) => p.test(f.path)) && f.value > BigInt(edit.start)) values.set(f.path, values.get(f.path)! + growth);
    const chunk = layout.chunks.find((c) => c.start <= edit.start && edit.start < c.end);
    if (chunk) for (const size of [".6", ".7"]) values.set(chunk.metaPath + size, values.get(chunk.metaPath + size)! + growth);
  }
  for (const [path, value] of footerValues) values.set(path, value);
  const footerEdits = layout.footer.filter((f) => values.get(f.path) !== f.value).map((f) => ({ start: f.start, end: f.end, bytes: compactInt(values.get(f.path)!) }));
  const data = splice(layout.bytes, 0, layout.footerStart, edits);
  const footer = splice(layout.bytes, layout.footerStart, layout.bytes.length - 8, footerEdits);
  const out = new Uint8Array(data.length + footer.length + 8);
  out.set(data);
  out.set(footer, data.length);
  new DataView(out.buffer).setUint32(out.length - 8, footer.length, true);
  out.set([0x50, 0x41, 0x52, 0x31], out.length - 4);
  return out;
}

function splice(bytes: Uint8Array, from: number, to: number, edits: readonly Edit[]): Uint8Array {
  const parts: Uint8Array[] = [];
  let at = from;
  for (const edit of [...edits].sort((a, b) => a.start - b.start)) {
    parts.push(bytes.subarray(at, edit.start), edit.bytes);
    at = edit.end;
  }
  parts.push(bytes.subarray(at, to));
  const out = new Uint8Array(parts.reduce((sum, p) => sum + p.length, 0));
  let k = 0;
  for (const p of parts) {
    out.set(p, k);
    k += p.length;
  }
  return out;
}

/** An edit that sets one integer field of a page header. */
export function intEdit(f: IntField, value: bigint): Edit {
  return { start: f.start, end: f.end, bytes: compactInt(value) };
}
