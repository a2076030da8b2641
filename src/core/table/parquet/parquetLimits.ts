/**
 * Limits that keep a damaged or hostile Parquet file from making the reader allocate without
 * bound: every size the file declares is checked against them before anything that size is made.
 */

/** Largest table read, in declared rows × columns read. */
export const maxParquetCells = 1e8; // the same budget as maxInputBytes: 0.8 GB as Float64 (our budget, no source)

/** A page may always decompress to this many bytes, whatever its compressed size. */
export const pageBytesFloor = 2 ** 20; // 1 MiB: the default page size of the common writers (parquet-mr parquet.page.size, Arrow data_pagesize)

/** Past the floor, a page may decompress to at most this many times its compressed size. */
export const maxPageExpansion = 1032; // deflate's largest ratio (M. Adler, zlib technical details, https://zlib.net/zlib_tech.html)

/** No page may decompress to more than this many bytes. */
export const maxPageBytes = 2 ** 28; // 256 MiB (our choice, no source)

/**
 * Largest decompressed size allowed for a page of `compressedBytes` bytes:
 *   min(maxPageBytes, max(pageBytesFloor, maxPageExpansion × compressedBytes)).
 * @example maxPageBytesFor(100) // => 1048576
 */
export function maxPageBytesFor(compressedBytes: number): number {
  return Math.min(maxPageBytes, Math.max(pageBytesFloor, maxPageExpansion * compressedBytes));
}
