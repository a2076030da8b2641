/**
 * CIELAB lightness L* of an sRGB colour ("#rrggbb" or "rgb(r, g, b)", channels 0–255), D65 white.
 * Linearise each channel (IEC 61966-2-1: c ≤ 0.04045 ? c/12.92 : ((c + 0.055)/1.055)^2.4), take the
 * relative luminance Y = 0.2126 R + 0.7152 G + 0.0722 B (the sRGB primaries' Y row), then
 *   L* = 116 f(Y) − 16, f(t) = t^(1/3) if t > (6/29)^3, else t / (3 (6/29)^2) + 4/29.
 * Source: CIE 15:2004, Colorimetry, 3rd edition, section 8.2.1.1 (CIE 1976 L*a*b*). O(1).
 * Throws for text that is neither form.
 * @example cieLightness("#777777") // => 50.03 to two decimals (worked by hand; see the test)
 */
export function cieLightness(colour: string): number {
  const [r, g, b] = rgbChannels(colour);
  const y = 0.2126 * linear(r) + 0.7152 * linear(g) + 0.0722 * linear(b); // IEC 61966-2-1, Y row of the sRGB → XYZ matrix
  const t = y > (6 / 29) ** 3 ? Math.cbrt(y) : y / (3 * (6 / 29) ** 2) + 4 / 29; // CIE 15:2004, 8.2.1.1
  return 116 * t - 16;
}

/**
 * The sRGB grey ("#rrggbb") whose CIELAB lightness is closest to `lightness` (0–100): the inverse of
 * `cieLightness` for R = G = B, Y = ((L* + 16)/116)^3 above L* = 8 and L* · (3/29)^3 below (CIE 15:2004, 8.2.1.1),
 * then the sRGB encoding, rounded to the nearest of 256 levels. O(1).
 * @example greyOfLightness(50) // => "#777777"
 */
export function greyOfLightness(lightness: number): string {
  if (!(lightness >= 0 && lightness <= 100)) throw new Error(`invalid lightness: ${lightness}`);
  const y = lightness > 8 ? ((lightness + 16) / 116) ** 3 : lightness * (3 / 29) ** 3;
  const encoded = y <= 0.0031308 ? 12.92 * y : 1.055 * y ** (1 / 2.4) - 0.055; // IEC 61966-2-1
  return hexOf([encoded * 255, encoded * 255, encoded * 255]);
}

/** Channels 0–255 of "#rrggbb" or "rgb(r, g, b)" (d3-scale-chromatic's interpolators give the latter). */
export function rgbChannels(colour: string): [number, number, number] {
  const hex = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(colour);
  if (hex) return [parseInt(hex[1]!, 16), parseInt(hex[2]!, 16), parseInt(hex[3]!, 16)];
  const rgb = /^rgb\((\d+), ?(\d+), ?(\d+)\)$/.exec(colour);
  if (rgb) return [Number(rgb[1]), Number(rgb[2]), Number(rgb[3])];
  throw new Error(`invalid colour: ${colour}`);
}

/** "#rrggbb" of channels 0–255 (rounded, clamped). */
export function hexOf(channels: readonly [number, number, number]): string {
  return `#${channels.map((c) => Math.min(255, Math.max(0, Math.round(c))).toString(16).padStart(2, "0")).join("")}`;
}

function linear(channel: number): number {
  const c = channel / 255;
  return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}
