import "./support/dom.ts";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { buildCover, defaultRadius, nodeRows, parseCsvText, scanHotspots, type ParsedTable } from "../../src/core/index.ts";
import { flareFigures as f } from "../../src/ui/panels/flareFigures.ts";
import { HowToRead } from "../../src/ui/panels/HowToRead.tsx";
import { assertClose } from "../assertClose.ts";

// The demo as the workbench opens it: every numeric column but pump_id and the two outcomes is a feature.
const features = ["age_years", "flow_m3h", "head_m", "power_kw", "efficiency_pct", "vibration_mm_s", "bearing_temp_c", "starts_per_day", "runtime_h_per_day", "suction_pressure_kpa"];

function meanOver(parsed: ParsedTable, name: string, rows: Iterable<number>): number {
  const numbers = parsed.columns.find((c) => c.name === name)!.numbers;
  let sum = 0;
  let count = 0;
  for (const row of rows) {
    if (Number.isNaN(numbers[row]!)) continue;
    sum += numbers[row]!;
    count++;
  }
  return sum / count;
}

describe("How to read this", () => {
  it("the demo figures the guide quotes hold for a fresh build of the demo at its default radius (each within half a unit of its last printed digit)", () => {
    const parsed = parseCsvText(readFileSync(join(process.cwd(), "public/demo/pump-fleet.csv"), "utf8"));
    const radius = defaultRadius(parsed, { features, metric: "euclidean", scale: "zscore", missing: "drop", weights: {} });
    expect(radius).toBe(f.radius); // the README's demo paragraph: 73 nodes at r = 0.417
    const result = buildCover(parsed, { features, scale: "zscore", metric: "euclidean", radius, landmarks: "greedy-file-order", seed: 1, missing: "drop", weights: {} });
    expect([result.landmarks.length, result.edges.source.length, result.componentCount, result.betti?.b1, result.usedRows.length]).toEqual([f.nodes, f.edges, f.components, f.b1, f.rowsUsed]); // shoal build's summary line
    const nodeShare = (node: number): number => meanOver(parsed, "failed_within_90d", Array.from(nodeRows(result.members, [node - 1])));
    const shares = Array.from({ length: result.landmarks.length }, (_, k) => ({ node: k + 1, share: nodeShare(k + 1) }));
    shares.sort((a, b) => b.share - a.share || a.node - b.node);
    expect(shares.slice(0, 5).map((s) => s.node)).toEqual([...f.flareNodes]); // nodes.csv's mean_failed_within_90d, highest first
    assertClose([shares[0]!.share, shares[1]!.share], [...f.topNodeShares], { absolute: 0.005 }); // printed as whole percents
    const inside = new Set(nodeRows(result.members, f.flareNodes.map((n) => n - 1)));
    const outside = Array.from(result.usedRows).filter((row) => !inside.has(row));
    expect(inside.size).toBe(f.rowsInside); // shoal explain --nodes 9,37,61,15,35: 157 rows inside
    assertClose(meanOver(parsed, "failed_within_90d", inside), f.failedInside, { absolute: 0.005 }); // printed as a whole percent
    assertClose(meanOver(parsed, "failed_within_90d", outside), f.failedOutside, { absolute: 0.005 });
    assertClose(meanOver(parsed, "vibration_mm_s", inside), f.vibrationInside, { absolute: 0.05 }); // printed to 0.1
    assertClose(meanOver(parsed, "vibration_mm_s", outside), f.vibrationOutside, { absolute: 0.05 });
    assertClose(meanOver(parsed, "suction_pressure_kpa", inside), f.suctionInside, { absolute: 0.5 }); // printed to 1
    assertClose(meanOver(parsed, "suction_pressure_kpa", outside), f.suctionOutside, { absolute: 0.5 });
    assertClose(meanOver(parsed, "age_years", inside), f.ageInside, { absolute: 0.5 });
    assertClose(meanOver(parsed, "age_years", outside), f.ageOutside, { absolute: 0.5 });
    // the region of highest score does not depend on the replicates (only its p-value does), so 99 keep this quick
    const scan = scanHotspots(parsed, result, { outcome: "failed_within_90d", replicates: 99 });
    expect(Array.from(scan.hotspots[0]!.nodes, (k) => k + 1)).toEqual([...f.hotspotNodes]); // the README's hotspot paragraph: nodes 3 9 15 35 37 42 43 61
  });

  it("explains node, edge, radius, metric, component and loop under one h2 and three h3 headings, and keeps the cautions", () => {
    render(<HowToRead />);
    expect(screen.getByRole("heading", { level: 2 }).textContent).toBe("How to read this");
    expect(screen.getAllByRole("heading", { level: 3 }).map((h) => h.textContent)).toEqual(["The parts of the picture", "Is a shape real?", "A walk through the demo's flare"]);
    expect(screen.getAllByRole("term").map((t) => t.textContent)).toEqual(["Node", "Edge", "Radius", "Metric and scaling", "Component", "Loop"]);
    const text = screen.getByRole("article").textContent ?? "";
    expect(text).toContain("not why");
    expect(text).toContain("the figures move with the radius, the metric and the scaling");
    expect(text).toContain("157 pumps, of which 50% failed within 90 days against 5% of the rest");
  });
});
