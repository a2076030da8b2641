const grouped = new Intl.NumberFormat("en-US");

/** Counts with thousands separators: 2400 → "2,400". */
export function formatCount(n: number): string {
  return grouped.format(n);
}

/** Statistics for reading (4 significant digits); the exports keep full precision. Missing → "–". */
export function formatNumber(x: number): string {
  if (Number.isNaN(x)) return "–";
  if (x === 0) return "0";
  const magnitude = Math.abs(x);
  if (magnitude >= 1e6 || magnitude < 1e-3) return x.toExponential(2);
  return String(Number(x.toPrecision(4)));
}

/** "1 row", "2,400 rows". */
export function plural(n: number, word: string): string {
  return `${formatCount(n)} ${n === 1 ? word : `${word}s`}`;
}
