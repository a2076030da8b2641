import type { PictureFacts } from "./pictureTypes.ts";

/**
 * The caption of a picture, one string per line, wrapped at `maxChars` characters between list items
 * (a single item longer than a line is kept whole): the file, the features, the scaling, metric,
 * radius, landmark rule and seed, the node and edge counts and the colour column. The radius is
 * written in JavaScript's shortest round-trip form, so it can be typed back exactly.
 * @example captionLines({ fileName: "a.csv", features: ["x"], scale: "zscore", metric: "euclidean", radius: 0.5, landmarks: "maximin", seed: 3, nodeCount: 2, edgeCount: 1, colourBy: null }, 80)
 * // => ["file: a.csv", "features (1): x", "scaling: zscore; metric: euclidean; radius: 0.5; landmarks: maximin, seed 3", "nodes: 2; edges: 1; colour: none"]
 */
export function captionLines(facts: PictureFacts, maxChars: number): string[] {
  const count = (n: number): string => String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ","); // thousands by commas, as en-US, without the locale tables
  return [
    ...wrapped(`file: `, [facts.fileName], maxChars),
    ...wrapped(`features (${facts.features.length}): `, facts.features, maxChars),
    ...wrapped("", [`scaling: ${facts.scale};`, `metric: ${facts.metric};`, `radius: ${String(facts.radius)};`, `landmarks: ${facts.landmarks}, seed ${facts.seed}`], maxChars, " "),
    ...wrapped("", [`nodes: ${count(facts.nodeCount)};`, `edges: ${count(facts.edgeCount)};`, `colour: ${facts.colourBy ?? "none"}`], maxChars, " "),
  ];
}

/** `head` then the items joined by `separator`, broken into lines of at most `maxChars` where an item ends; later lines indented by two spaces. */
function wrapped(head: string, items: readonly string[], maxChars: number, separator = ", "): string[] {
  const lines: string[] = [];
  let line = head;
  let fresh = true;
  for (const [k, item] of items.entries()) {
    const piece = k < items.length - 1 && separator === ", " ? `${item},` : item;
    const joined = fresh ? line + piece : `${line} ${piece}`;
    if (!fresh && joined.length > maxChars) {
      lines.push(line);
      line = `  ${piece}`;
    } else line = joined;
    fresh = false;
  }
  lines.push(line);
  return lines;
}
