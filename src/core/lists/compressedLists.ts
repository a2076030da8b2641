/** Compressed lists: the items of list k are items[offsets[k] .. offsets[k + 1]). */
export interface CompressedLists {
  readonly offsets: Uint32Array;
  readonly items: Uint32Array;
}

/**
 * Transposes node → rows lists into row → nodes lists (nodes ascending for each row). O(m) for m memberships.
 */
export function rowsToNodes(members: CompressedLists, rows: number): CompressedLists {
  return transposeLists(members.offsets, [members.items], rows);
}

/**
 * The transpose of lists whose items are the concatenation of `pieces` (list k holds items
 * offsets[k]..offsets[k+1]−1): for each of `rows` rows, the lists holding it, ascending. With
 * `rowOf`, item x stands for row rowOf[x] (items numbered in another order, e.g. tree positions).
 * Transposing twice gives the lists with their rows ascending. O(m + rows) for m items.
 * @example transposeLists([0, 2, 3], [Uint32Array.of(1, 0), Uint32Array.of(0)], 2).items // => Uint32Array [0, 1, 0]
 */
export function transposeLists(offsets: ArrayLike<number>, pieces: readonly Uint32Array[], rows: number, rowOf?: Uint32Array): CompressedLists {
  const counts = new Uint32Array(rows + 1);
  let total = 0;
  for (const piece of pieces) {
    // two loops rather than one with a lookup function: this runs once per membership
    if (rowOf) for (let t = 0; t < piece.length; ++t) counts[rowOf[piece[t]!]! + 1]!++;
    else for (let t = 0; t < piece.length; ++t) counts[piece[t]! + 1]!++;
    total += piece.length;
  }
  for (let i = 0; i < rows; ++i) counts[i + 1]! += counts[i]!;
  const cursor = counts.slice(0, rows);
  const items = new Uint32Array(total);
  let k = 0;
  let at = 0; // index of the item in the concatenation
  for (const piece of pieces) {
    for (let t = 0; t < piece.length; ) {
      while (at >= offsets[k + 1]!) ++k;
      // the rest of list k that lies in this piece
      const stop = Math.min(piece.length, t + (offsets[k + 1]! - at));
      at += stop - t;
      if (rowOf) for (; t < stop; ++t) items[cursor[rowOf[piece[t]!]!]!++] = k;
      else for (; t < stop; ++t) items[cursor[piece[t]!]!++] = k;
    }
  }
  return { offsets: counts, items };
}
