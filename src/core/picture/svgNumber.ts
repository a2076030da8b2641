/**
 * A coordinate for SVG with two decimals (a hundredth of a pixel), so the same layout writes the same
 * bytes; −0.00 is written 0.00. Throws for a non-finite number (it would make the file invalid).
 * @example svgNumber(-0.001) // => "0.00"
 */
export function svgNumber(value: number): string {
  if (!Number.isFinite(value)) throw new Error(`invalid coordinate: ${value}`);
  const text = value.toFixed(2);
  return text === "-0.00" ? "0.00" : text;
}

/**
 * A value for a label: four significant digits in JavaScript's shortest form (ECMA-262
 * Number::toString of the value rounded by toPrecision), so labels are short and stable.
 * @example labelNumber(1234.5678) // => "1235"
 */
export function labelNumber(value: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(4))) : String(value);
}
