import { flareFigures as f } from "./flareFigures.ts";

const percent = (share: number): string => `${Math.round(share * 100)}%`;

/** A plain-language guide for analysts who are not topologists: the parts of the picture, how to test a shape, and a walk through the demo's flare. */
export function HowToRead() {
  return (
    <article className="how-to-read" aria-labelledby="how-to-read-title">
      <h2 id="how-to-read-title">How to read this</h2>
      <p>
        The graph summarises every row of your table at once, across all the feature columns. It is a map for
        exploring: it shows where rows crowd together and where an outcome gathers, not why.
      </p>
      <h3>The parts of the picture</h3>
      <dl>
        <dt>Node</dt>
        <dd>
          A group of similar rows. One row is taken as a landmark, and the node holds every row within the radius of it.
          A bigger disc holds more rows; its fill is the node&apos;s average of the column chosen under &ldquo;Colour by&rdquo;.
          A row close to two landmarks belongs to both nodes.
        </dd>
        <dt>Edge</dt>
        <dd>
          A line between two nodes that hold some of the same rows; thicker lines share more. Joined nodes are
          neighbours in the data. Where a node sits on the screen, and how far apart two unjoined nodes are drawn, means nothing.
        </dd>
        <dt>Radius</dt>
        <dd>
          How far a row may lie from its landmark, after scaling. A smaller radius gives more, smaller nodes and finer
          detail; a larger one merges them into a few coarse ones.
        </dd>
        <dt>Metric and scaling</dt>
        <dd>
          How the distance between two rows is measured (straight-line, sum of differences, largest difference, or by
          angle), and how each column is put on a common footing first, so that a column counted in thousands does not
          outweigh one counted in tenths.
        </dd>
        <dt>Component</dt>
        <dd>A set of nodes joined by edges. Separate components are groups of rows that do not overlap at this radius.</dd>
        <dt>Loop</dt>
        <dd>
          A ring of nodes around an empty middle (b1 counts them): rows that change step by step and come back to where
          they began, as a daily cycle does. The cycle rank also counts every small triangle of overlapping nodes, so read b1 for loops.
        </dd>
      </dl>
      <h3>Is a shape real?</h3>
      <ul>
        <li>
          <strong>Sweep the radius</strong> (Stability tab): a branch or loop worth trusting lasts over a run of radii, a
          shaded plateau, rather than at one radius only.
        </li>
        <li>
          <strong>Try other seeds</strong> (Stability tab): the landmarks are picked in another order; a real shape keeps
          its node and loop counts, and its rows keep landing together.
        </li>
        <li>
          <strong>Change the metric or the scaling</strong>: a shape that vanishes under a sensible alternative says more
          about the choice than about the data.
        </li>
        <li>
          <strong>Mind the search</strong>: the region pane describes how a chosen group differs; only the hotspot scan&apos;s
          p-values allow for having looked everywhere, and only at the settings it ran with.
        </li>
      </ul>
      <h3>A walk through the demo&apos;s flare</h3>
      <p>
        The demo table is invented: about 2,400 pumps of an imaginary water utility. At its default radius of {f.radius} the
        graph has {f.nodes} nodes, {f.edges} edges, {f.components} component and {f.b1} loop, built from {f.rowsUsed.toLocaleString("en-US")} rows.
      </p>
      <ol>
        <li>
          Colour by <code>failed_within_90d</code> (the demo opens that way). A short branch of bright yellow nodes sticks out from
          the body of the graph: the flare.
        </li>
        <li>
          Switch to the node table and sort by the colour column: nodes {f.flareNodes[0]} and {f.flareNodes[1]} come first
          ({percent(f.topNodeShares[0])} and {percent(f.topNodeShares[1])} of their pumps failed), then {f.flareNodes.slice(2).join(", ")}.
        </li>
        <li>
          Select those five nodes (shift-click each, or shift+Enter on each in the nodes list), keep them as a region and open the Region tab: {f.rowsInside} pumps,
          of which {percent(f.failedInside)} failed within 90 days against {percent(f.failedOutside)} of the rest. They
          vibrate more ({f.vibrationInside} against {f.vibrationOutside} mm/s), run at lower suction pressure ({f.suctionInside} against{" "}
          {f.suctionOutside} kPa) and are older ({f.ageInside} against {f.ageOutside} years).
        </li>
        <li>
          The Hotspots tab&apos;s scan of <code>failed_within_90d</code> finds the same place: its top hotspot holds these
          five nodes and {f.hotspotNodes.length - f.flareNodes.length} of their neighbours, with a p-value that allows for the search.
        </li>
        <li>
          Then check it: sweep the radius and try other seeds, and see whether the branch and its high failure share persist.
        </li>
      </ol>
      <p className="note">
        Even then the flare shows where failures gather, not what causes them: low suction, vibration and age travel
        together here, and the figures move with the radius, the metric and the scaling.
      </p>
    </article>
  );
}
