/**
 * The cautions, word for word as in the README's "Read with care" section (a test compares each
 * sentence both ways): a short heading, then the sentences.
 */
export const cautionItems: readonly { readonly heading: string; readonly text: string }[] = [
  { heading: "Exploratory, not causal.", text: "A node where an outcome is high shows where it concentrates, not why." },
  { heading: "Parameters matter.", text: "The graph depends on the radius, the metric and the scaling; check that a shape persists when they change." },
  { heading: "Multiple comparisons.", text: "Looking at many nodes and regions, some will stand out by chance alone." },
  {
    heading: "Data protection.",
    text: "Shoal sends nothing anywhere, but the exports contain row-level data: follow your organisation's data-protection rules.",
  },
  { heading: "People.", text: "Decisions about individuals need qualified review; a node membership is not a diagnosis or a verdict." },
];
