/** How nodes are filled: a number per node on a sequential scale, a level per node, or nothing. */
export type NodeFill =
  | { readonly kind: "sequential"; readonly values: Float64Array; readonly caption: string }
  | { readonly kind: "categorical"; readonly level: Int32Array; readonly levels: readonly string[]; readonly caption: string };
