import { existsSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { Resvg } from "@resvg/resvg-js";

const fontPath = join("assets", "fonts", "DejaVuSans.ttf");

/** The project's DejaVu Sans: the first assets/fonts/DejaVuSans.ttf found from this module's folder upwards (so a bundled command finds it too). */
export function shippedFont(): string {
  for (let folder = dirname(fileURLToPath(import.meta.url)); ; folder = dirname(folder)) {
    const candidate = join(folder, fontPath);
    if (existsSync(candidate)) return candidate;
    if (dirname(folder) === folder) throw new Error(`cannot find the shipped font ${fontPath}`);
  }
}

/**
 * An SVG drawn to PNG by resvg (@resvg/resvg-js), at `density` device pixels per SVG pixel, with the
 * shipped DejaVu Sans as the only font (system fonts are not loaded), so the text looks the same on
 * every machine.
 */
export function renderPng(svg: string, density: number): Uint8Array {
  const font = shippedFont();
  const image = new Resvg(svg, {
    fitTo: { mode: "zoom", value: density },
    font: { loadSystemFonts: false, fontFiles: [font], defaultFontFamily: "DejaVu Sans", sansSerifFamily: "DejaVu Sans" },
    logLevel: "off",
  }).render();
  return new Uint8Array(image.asPng());
}
