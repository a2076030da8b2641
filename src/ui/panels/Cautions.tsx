/** Always on screen: what these pictures can and cannot support. */
export function Cautions() {
  return (
    <footer className="cautions" aria-label="cautions">
      <strong>Read with care.</strong> Exploratory, not causal: a region where an outcome is high does not show why. The graph
      depends on the radius, the metric and the scaling. Looking at many regions is a multiple comparison: some will stand out
      by chance. Follow your organisation's data-protection rules (the table stays on this machine). Decisions about individuals
      need qualified review.
    </footer>
  );
}
