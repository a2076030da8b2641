import { randomSource, type ParsedTable } from "../src/core/index.ts";

/** Points uniform in the unit cube, as a parsed table with columns x1..xd. Seeded. */
export function uniformCube(rows: number, dims: number, seed: number): ParsedTable {
  const random = randomSource(seed);
  return columns(rows, dims, () => random());
}

/** A mixture of `clusters` spherical Gaussians (sd 1) with centres uniform in [−10, 10]^d. Box–Muller normals. Seeded. */
export function gaussianClusters(rows: number, dims: number, clusters: number, seed: number): ParsedTable {
  const random = randomSource(seed);
  const normal = (): number => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
  const centres = Array.from({ length: clusters }, () => Array.from({ length: dims }, () => 20 * random() - 10));
  const assignment = Array.from({ length: rows }, () => Math.floor(random() * clusters));
  return columns(rows, dims, (i, j) => centres[assignment[i]!]![j]! + normal());
}

function columns(rows: number, dims: number, value: (i: number, j: number) => number): ParsedTable {
  const data = Array.from({ length: dims }, () => new Float64Array(rows));
  for (let i = 0; i < rows; ++i) for (let j = 0; j < dims; ++j) data[j]![i] = value(i, j);
  return { rows, columns: data.map((numbers, j) => ({ name: `x${j + 1}`, kind: "numeric" as const, numbers, texts: null, missing: 0 })) };
}
