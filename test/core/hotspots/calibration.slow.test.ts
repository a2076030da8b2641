// Calibration of the permutation p-value: 200 invented tables whose outcome is independent of the
// features. Run time on the 2-core build machine: about 12–16 s (measured with
// `npx vitest run test/core/hotspots/calibration.slow.test.ts`), within the 3-minute budget.
import { expect, it } from "vitest";
import { buildCover, scanHotspots } from "../../../src/core/index.ts";
import { syntheticTable } from "./synthetic.ts";

const tables = 200;

it("on 200 tables of 400 rows with an outcome independent of the features, 3 to 18 runs have p ≤ 0.05 (99 replicates each)", () => {
  let significant = 0;
  for (let seed = 1; seed <= tables; ++seed) {
    // 400 rows × 3 standard normal features; the outcome is 1 with probability 0.2, drawn after and apart from them
    const table = syntheticTable(400, 3, seed, (_columns, random) => Float64Array.from({ length: 400 }, () => (random() < 0.2 ? 1 : 0)));
    // one build per table at a fixed radius (about 80 nodes), without the loops step the scan does not read
    const result = buildCover(table, { features: ["f1", "f2", "f3"], scale: "zscore", metric: "euclidean", radius: 0.8, landmarks: "greedy-file-order", seed: 1 }, { loops: false });
    const scan = scanHotspots(table, result, { outcome: "y", replicates: 99, scanSeed: seed });
    if ((scan.hotspots[0]?.p ?? 1) <= 0.05) ++significant;
  }
  console.log(`calibration: ${significant} of ${tables} runs with p ≤ 0.05 (expected about 10)`);
  // the product owner's 3–18, a 99% binomial interval for Binomial(200, 0.05): scipy.stats.binom gives P(X ≤ 2) = 0.0023 and P(X ≤ 18) = 0.9942
  expect(significant).toBeGreaterThanOrEqual(3);
  expect(significant).toBeLessThanOrEqual(18);
}, 180_000);
