/** A run of consecutive sweep radii (ascending) over which b0 and b1 do not change. */
export interface Plateau {
  /** Indices of its first and last radius in the sweep (ascending order). */
  readonly first: number;
  readonly last: number;
  readonly radiusLow: number;
  readonly radiusHigh: number;
  readonly b0: number;
  readonly b1: number;
  /** ln(upper / lower): each radius stands for the stretch of log r halfway to its neighbours (none past the sweep's ends). */
  readonly logWidth: number;
}

/**
 * Plateaus of a sweep: maximal runs i..j of consecutive radii (ascending) with equal b0 and
 * equal b1, optionally only among radii where `keep(k)` holds (a run ends at any radius left
 * out). Width in log-radius: lower = √(r_{i−1} r_i) (r_i at the first radius), upper =
 * √(r_j r_{j+1}) (r_j at the last), logWidth = ln(upper / lower). O(K).
 * @example plateaus([1, 2, 4, 8], [1, 1, 1, 2], [0, 0, 0, 0]) // => runs 0..2 (logWidth 2.5 ln 2) and 3..3 (logWidth 0.5 ln 2)
 */
export function plateaus(radii: ArrayLike<number>, b0: ArrayLike<number>, b1: ArrayLike<number>, keep: (k: number) => boolean = () => true): Plateau[] {
  const count = radii.length;
  const out: Plateau[] = [];
  for (let first = 0; first < count; ) {
    if (!keep(first)) {
      first++;
      continue;
    }
    let last = first;
    while (last + 1 < count && keep(last + 1) && b0[last + 1] === b0[first] && b1[last + 1] === b1[first]) last++;
    const lower = first > 0 ? Math.sqrt(radii[first - 1]! * radii[first]!) : radii[first]!;
    const upper = last + 1 < count ? Math.sqrt(radii[last]! * radii[last + 1]!) : radii[last]!;
    out.push({ first, last, radiusLow: radii[first]!, radiusHigh: radii[last]!, b0: b0[first]!, b1: b1[first]!, logWidth: Math.log(upper / lower) });
    first = last + 1;
  }
  return out;
}
