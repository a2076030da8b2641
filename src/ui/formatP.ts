import { formatNumber } from "./format.ts";

/**
 * A p-value for reading: below 0.0001 "< 0.0001"; from 0.0001 to 0.001 four decimals (formatNumber
 * would write 1.00e-4 there, which reads oddly beside "< 0.0001"); otherwise formatNumber; missing "–".
 */
export function formatP(p: number): string {
  if (p < 1e-4) return "< 0.0001";
  if (p < 1e-3) return p.toFixed(4);
  return formatNumber(p);
}
