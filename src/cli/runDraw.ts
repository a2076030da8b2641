import { majorityNodes } from "../core/index.ts";
import { columnFill } from "../core/picture/columnFill.ts";
import { pictureSvg } from "../core/picture/pictureSvg.ts";
import { seededLayout } from "../core/picture/seededLayout.ts";
import { buildFromFile } from "./buildFromFile.ts";
import type { DrawCommand } from "./parseDrawArgs.ts";
import { chosenRows } from "./regionArgs.ts";
import { renderPng } from "./renderPng.ts";
import { writeFileWhole } from "./writeFileWhole.ts";
import { recipeOfRun, recipeRegionRows, recipeToSave, saveRecipe } from "./recipeOfRun.ts";

/** The picture's SVG text for a command: build as `shoal build` does, lay out with the seeded layout, draw. */
export async function drawSvg(command: DrawCommand): Promise<{ svg: string; summary: string; save: () => Promise<string> }> {
  const { table, fileName, radius, result, fingerprint } = await buildFromFile(command);
  const fill = columnFill(table, result.members, command.colourBy);
  const layout = seededLayout(result, { seed: command.layoutSeed });
  // the recipe's regions, then --region-nodes; each outlined where it holds most of a node's rows
  const kept = recipeRegionRows(command.recipe, result.rowsRead);
  if (command.region && kept.some((r) => r.name === command.region!.name)) throw new Error(`--region-name is the name of a region of the recipe: ${command.region.name}`);
  const regions = [...kept, ...(command.region ? [{ name: command.region.name, rows: chosenRows(command.region.choice, result) }] : [])];
  const outlines = regions.map((region) => ({ name: region.name, nodes: majorityNodes(result.members, region.rows, result.rowsRead) }));
  const recipe = recipeToSave(command.recipe, () => recipeOfRun(command, { fileName, fingerprint: fingerprint!, read: command.read, params: result.params, regions }));
  const { params } = result;
  const oneHot = (params.oneHot ?? []).map((name) => `${name} (one-hot)`);
  const svg = pictureSvg({
    width: command.width,
    height: command.height,
    x: layout.x,
    y: layout.y,
    radius: layout.radius,
    edges: {
      source: Array.from(layout.edges, (e) => result.edges.source[e]!),
      target: Array.from(layout.edges, (e) => result.edges.target[e]!),
      shared: Array.from(layout.edges, (e) => result.edges.shared[e]!),
    },
    fill,
    outlines,
    greyscale: command.greyscale,
    facts: {
      fileName, features: [...params.features, ...oneHot], scale: params.scale, metric: params.metric, radius, landmarks: params.landmarks, seed: params.seed,
      nodeCount: result.landmarks.length, edgeCount: result.edges.source.length, colourBy: command.colourBy,
    },
  });
  return { svg, summary: `${result.landmarks.length} nodes, ${result.edges.source.length} edges at radius ${radius}`, save: () => saveRecipe(command.recipe, recipe) };
}

/** `shoal draw`: writes the SVG, or the PNG drawn from it at the density, whole or not at all; returns one line for the terminal. */
export async function runDraw(command: DrawCommand): Promise<string> {
  const { svg, summary, save } = await drawSvg(command);
  if (command.format === "svg") await writeFileWhole(command.out, svg);
  else await writeFileWhole(command.out, renderPng(svg, command.density));
  const saved = await save();
  const pixels = command.format === "png" ? ` (${command.width * command.density}x${command.height * command.density} pixels)` : "";
  return `${summary}; wrote ${command.out}${pixels}${saved}`;
}
