import type { Recipe } from "../../core/index.ts";

/**
 * True when two recipes give the same build: they differ at most in what is drawn over a graph
 * (colour, named regions, hotspot settings) or in the program that wrote them, so going from one
 * to the other needs no rebuild.
 */
export function sameBuild(a: Recipe, b: Recipe): boolean {
  const buildPart = ({ colour: _colour, regions: _regions, hotspots: _hotspots, writtenBy: _writtenBy, ...rest }: Recipe): string => JSON.stringify(rest);
  return buildPart(a) === buildPart(b);
}
