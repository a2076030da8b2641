import { forceCollide, forceLink, forceManyBody, forceSimulation, forceX, forceY, type SimulationLinkDatum, type SimulationNodeDatum } from "d3-force";
import { randomSource, shuffledOrder } from "../random.ts";
import type { CoverGraph } from "../cover/coverGraph.ts";
import { nodeRadius } from "./nodeRadius.ts";

/** Where each node ends up, in layout units (a picture fits them to its frame), with its radius and the edges laid out. */
export interface SeededLayout {
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly radius: Float64Array;
  /** Indices into the graph's edge list of the edges laid out (and drawn), ascending. */
  readonly edges: Uint32Array;
}

export interface SeededLayoutOptions {
  /** Seed of the starting places and of d3-force's jiggle (default 1). */
  readonly seed?: number;
  /** At most this many edges are springs: those sharing the most rows, ties to the lower edge number (default 4,000, as the workbench draws). */
  readonly maxEdges?: number;
}

interface Body extends SimulationNodeDatum {
  radius: number;
  x: number;
  y: number;
}

const initialRadius = 10; // d3-force's phyllotaxis spacing (d3-force/src/simulation.js)
const initialAngle = Math.PI * (3 - Math.sqrt(5)); // the golden angle, as d3-force places bodies

/**
 * Force layout of a cover graph that gives the same places for the same graph and seed, in any run.
 * Bodies and forces as in the workbench: one body per node with area ∝ members (`nodeRadius`), a
 * spring per edge (length r_a + r_b + 14, strength 0.7; the `maxEdges` sharing the most rows),
 * many-body charge −60, collision at r + 2, and a pull of 0.05 to the centre in x and y.
 * Start: the bodies take the places of d3-force's phyllotaxis spiral in an order shuffled by the
 * seed (xoshiro128**, core/random.ts), and the same seeded stream is d3-force's random source.
 * Stopping rule: d3-force's own, run synchronously: alpha starts at 1 and decays by the factor
 * (1 − alphaDecay) per tick with alphaDecay = 1 − alphaMin^(1/300), alphaMin = 0.001, so it reaches
 * alphaMin after exactly ⌈ln(alphaMin) / ln(1 − alphaDecay)⌉ = 300 ticks; the layout takes those
 * 300 ticks and stops (no timer runs). Source: M. Bostock, d3-force 3.0 (simulation.js), 2021.
 * Cost: 300 ticks of O(n log n) (Barnes–Hut charge, quadtree collision) plus O(E) springs.
 * A graph with no nodes gives empty arrays.
 * @example seededLayout(graph, { seed: 1 }).x.length // => graph.landmarks.length
 */
export function seededLayout(graph: Pick<CoverGraph, "landmarks" | "members" | "edges">, options: SeededLayoutOptions = {}): SeededLayout {
  const { seed = 1, maxEdges = 4000 } = options;
  const n = graph.landmarks.length;
  const { offsets } = graph.members;
  let maxSize = 1;
  for (let k = 0; k < n; ++k) maxSize = Math.max(maxSize, offsets[k + 1]! - offsets[k]!);
  const random = randomSource(seed);
  const slot = shuffledOrder(n, random);
  const bodies: Body[] = Array.from({ length: n }, (_, k) => {
    const place = slot[k]!;
    const distance = initialRadius * Math.sqrt(0.5 + place);
    return { radius: nodeRadius(offsets[k + 1]! - offsets[k]!, maxSize), x: distance * Math.cos(place * initialAngle), y: distance * Math.sin(place * initialAngle) };
  });
  const edges = strongestEdges(graph.edges.shared, maxEdges);
  const links: SimulationLinkDatum<Body>[] = Array.from(edges, (e) => ({ source: graph.edges.source[e]!, target: graph.edges.target[e]! }));
  const simulation = forceSimulation<Body>(bodies)
    .randomSource(random)
    .force("link", forceLink<Body, SimulationLinkDatum<Body>>(links).distance((l) => (l.source as Body).radius + (l.target as Body).radius + 14).strength(0.7))
    .force("charge", forceManyBody<Body>().strength(-60))
    .force("collide", forceCollide<Body>((b) => b.radius + 2))
    .force("x", forceX<Body>(0).strength(0.05))
    .force("y", forceY<Body>(0).strength(0.05))
    .stop();
  simulation.tick(layoutTicks(simulation.alphaMin(), simulation.alphaDecay()));
  return {
    x: Float64Array.from(bodies, (b) => b.x),
    y: Float64Array.from(bodies, (b) => b.y),
    radius: Float64Array.from(bodies, (b) => b.radius),
    edges,
  };
}

/**
 * Ticks for alpha to decay from 1 to alphaMin: ⌈ln(alphaMin) / ln(1 − alphaDecay)⌉, with the quotient
 * rounded to 9 decimals first so that d3's own alphaDecay = 1 − alphaMin^(1/300) gives 300, not 301 by rounding error.
 * @example layoutTicks(0.001, 1 - 0.001 ** (1 / 300)) // => 300
 */
export function layoutTicks(alphaMin: number, alphaDecay: number): number {
  if (!(alphaMin > 0 && alphaMin < 1) || !(alphaDecay > 0 && alphaDecay < 1)) throw new Error(`invalid alpha settings: alphaMin ${alphaMin}, alphaDecay ${alphaDecay}`);
  return Math.ceil(Number((Math.log(alphaMin) / Math.log(1 - alphaDecay)).toFixed(9)));
}

/** Edge numbers of the `limit` edges sharing the most rows (ties to the lower number), ascending; all of them when there are no more. */
function strongestEdges(shared: Uint32Array, limit: number): Uint32Array {
  const all = Uint32Array.from(shared, (_, e) => e);
  if (all.length <= limit) return all;
  const chosen = Array.from(all).sort((a, b) => shared[b]! - shared[a]! || a - b).slice(0, limit);
  return Uint32Array.from(chosen).sort();
}
