export interface Components {
  /** Component number of each node; components are numbered 0.. in order of their lowest node. */
  readonly component: Uint32Array;
  readonly count: number;
}

/**
 * Connected components by union–find with path halving and union by index.
 * Source: R. E. Tarjan, J. ACM 22(2):215–225, 1975. O((V + E) α(V)).
 * @example components(3, Uint32Array.of(0), Uint32Array.of(2)).component // => Uint32Array [0, 1, 0]
 */
export function components(nodes: number, source: Uint32Array, target: Uint32Array): Components {
  const parent = new Uint32Array(nodes);
  for (let k = 0; k < nodes; ++k) parent[k] = k;
  const find = (k: number): number => {
    while (parent[k] !== k) {
      parent[k] = parent[parent[k]!]!;
      k = parent[k]!;
    }
    return k;
  };
  for (let e = 0; e < source.length; ++e) {
    const a = find(source[e]!);
    const b = find(target[e]!);
    // the lower root wins, so each component's root is its lowest node
    if (a < b) parent[b] = a;
    else if (b < a) parent[a] = b;
  }
  const component = new Uint32Array(nodes);
  const label = new Map<number, number>();
  for (let k = 0; k < nodes; ++k) {
    const root = find(k);
    let c = label.get(root);
    if (c === undefined) label.set(root, (c = label.size));
    component[k] = c;
  }
  return { component, count: label.size };
}
