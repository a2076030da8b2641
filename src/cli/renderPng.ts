import { existsSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { createRequire } from "node:module";
import type { Resvg as ResvgClass } from "@resvg/resvg-js";

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
  // loaded on first use, through Node's own resolution: its native binary cannot go into the
  // command's bundle, and other commands need not load it at start-up
  const { Resvg } = createRequire(import.meta.url)("@resvg/resvg-js") as { Resvg: typeof ResvgClass };
  const font = shippedFont();
  const image = new Resvg(svg, {
    fitTo: { mode: "zoom", value: density },
    font: { loadSystemFonts: false, fontFiles: [font], defaultFontFamily: "DejaVu Sans", sansSerifFamily: "DejaVu Sans" },
    logLevel: "off",
  }).render();
  return new Uint8Array(image.asPng());
}
