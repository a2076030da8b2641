/**
 * Checks one RLE / bit-packing hybrid stream (Apache Parquet format, "Encodings", RLE) before the
 * decoder expands it. Each run starts with a ULEB128 header h: h & 1 = 0 is a run of h >>> 1 copies
 * of one value of ceil(bitWidth / 8) bytes; h & 1 = 1 is (h >> 1) groups of 8 bit-packed values,
 * bitWidth bytes per group. hyparquet's decoder writes every value of a run, past the end of its
 * output array too, so a 6-byte run header could make it write 2^31 values; this scan reads the
 * headers with the decoder's own 32-bit arithmetic and fails once the runs before `limit` values
 * declare more than limit + 7 (a bit-packed run is padded to a multiple of 8) or a negative count.
 * It stops at `limit` values or at `end`. O(runs); reads no value.
 * @example checkHybridRuns(new DataView(Uint8Array.of(8, 1).buffer), 0, 2, 1, 4) // => 4 (one run of 4 ones)
 */
export function checkHybridRuns(view: DataView, offset: number, end: number, bitWidth: number, limit: number): number {
  let total = 0;
  let at = offset;
  while (total < limit && at < end) {
    let header = 0;
    for (let shift = 0; ; shift += 7) {
      if (at >= end) return total;
      const byte = view.getUint8(at++);
      header |= (byte & 0x7f) << shift; // the decoder's readVarInt: 32-bit, shifts wrap
      if (!(byte & 0x80)) break;
    }
    const count = header & 1 ? (header >> 1) << 3 : header >>> 1;
    total += count;
    if (count < 0 || total > limit + 7) throw new Error(`a run declares ${count} values where at most ${limit} fit`);
    at += header & 1 ? (header >> 1) * bitWidth : (bitWidth + 7) >> 3;
  }
  return total;
}
