import { bfsComponents } from "./bruteForce.ts";

/**
 * An independent computation of the sampled nerve's b0 and b1 over GF(2), written from the
 * definitions and sharing no code with src/:
 *  - edges: node pairs a < b whose balls share a row, found by intersecting row sets;
 *  - triangles: triples a < b < c whose three balls share a row;
 *  - rank ∂2: the edge × triangle incidence matrix (an entry 1 when the edge is a side of the
 *    triangle), reduced to row-echelon form by textbook Gaussian elimination over GF(2), rows
 *    stored as bit arrays (32 triangles per Uint32 word), pivots chosen column by column;
 *  - b0 by breadth-first search; b1 = dim ker ∂1 − rank ∂2 = E − V + b0 − rank ∂2.
 */
export interface IndependentNerve {
  readonly edges: [number, number][];
  readonly triangles: [number, number, number][];
  readonly b0: number;
  readonly b1: number;
  readonly boundaryRank: number;
}

export function independentNerve(balls: readonly (readonly number[])[]): IndependentNerve {
  const nodes = balls.length;
  const sets = balls.map((ball) => new Set(ball));
  const edges: [number, number][] = [];
  const edgeNumber = new Map<string, number>();
  for (let a = 0; a < nodes; ++a) {
    for (let b = a + 1; b < nodes; ++b) {
      if (!balls[a]!.some((row) => sets[b]!.has(row))) continue;
      edgeNumber.set(`${a},${b}`, edges.length);
      edges.push([a, b]);
    }
  }
  const triangles: [number, number, number][] = [];
  for (const [a, b] of edges) {
    for (let c = b + 1; c < nodes; ++c) {
      if (!edgeNumber.has(`${a},${c}`) || !edgeNumber.has(`${b},${c}`)) continue;
      if (balls[a]!.some((row) => sets[b]!.has(row) && sets[c]!.has(row))) triangles.push([a, b, c]);
    }
  }
  triangles.sort((p, q) => p[0] - q[0] || p[1] - q[1] || p[2] - q[2]);
  const boundary = triangles.map(([a, b, c]) => [edgeNumber.get(`${a},${b}`)!, edgeNumber.get(`${a},${c}`)!, edgeNumber.get(`${b},${c}`)!]);
  const boundaryRank = gf2Rank(edges.length, triangles.length, boundary);
  const b0 = bfsComponents(nodes, edges.map((e) => e[0]), edges.map((e) => e[1])).count;
  return { edges, triangles, b0, b1: edges.length - nodes + b0 - boundaryRank, boundaryRank };
}

/**
 * Rank over GF(2) of a rows × columns 0/1 matrix given by the set rows of each column, by
 * Gaussian elimination on dense bit rows: for each column, find a row at or below the current
 * pivot row with a 1 there, swap it up, and add it (XOR) to every other row with a 1 there.
 */
export function gf2Rank(rows: number, columns: number, entriesOfColumn: readonly (readonly number[])[]): number {
  const words = Math.ceil(columns / 32);
  const matrix = Array.from({ length: rows }, () => new Uint32Array(words));
  entriesOfColumn.forEach((entries, column) => {
    for (const row of entries) matrix[row]![column >>> 5]! ^= 1 << (column & 31);
  });
  let rank = 0;
  for (let column = 0; column < columns && rank < rows; ++column) {
    const word = column >>> 5;
    const bit = 1 << (column & 31);
    let pivot = -1;
    for (let r = rank; r < rows; ++r) {
      if (matrix[r]![word]! & bit) {
        pivot = r;
        break;
      }
    }
    if (pivot < 0) continue;
    [matrix[rank], matrix[pivot]] = [matrix[pivot]!, matrix[rank]!];
    const top = matrix[rank]!;
    for (let r = 0; r < rows; ++r) {
      if (r === rank || !(matrix[r]![word]! & bit)) continue;
      const target = matrix[r]!;
      for (let w = 0; w < words; ++w) target[w]! ^= top[w]!;
    }
    rank++;
  }
  return rank;
}
