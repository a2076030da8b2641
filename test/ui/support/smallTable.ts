import { act } from "@testing-library/react";
import { actions } from "../../../src/state/actions.ts";

/**
 * Eight invented rows in three groups along the diagonal: A = p1–p3 near (2, 2), a bridge p4 at
 * (7, 7), B = p6–p8 near (12, 12); p5 has no x, so it is left out of every build on x.
 * `score` is an outcome (10 per step), `site` a repeated text column, `id` unique text.
 *
 * Worked by hand at radius 1.4 on z-scored x and y (features x, y; used rows p1–p4, p6–p8):
 *   x and y each: mean 7, Σ(v − 7)² = 36 + 25 + 16 + 0 + 16 + 25 + 36 = 154, sd = √(154/6) = 5.066,
 *   so 1.4 in z-units is 7.09 in raw units. Raw distances: within A or within B ≤ √5 = 2.24;
 *   p4 to p3 √32 = 5.66, to p6 and p7 √41 = 6.40, to p1 and p2 √61 = 7.81, to p8 √72 = 8.49.
 *   Greedy net in file order: p1 (covers p2, p3), p4 (p1 is 7.81 away), p8 (p4 is 8.49 away).
 *   Node 1 = {p1, p2, p3}; node 2 = {p3, p4, p6, p7}; node 3 = {p6, p7, p8}.
 *   Edges 1–2 (shares p3) and 2–3 (shares p6, p7): 3 nodes, 2 edges, 1 component.
 */
export const smallCsv = [
  "id,x,y,score,site",
  "p1,1,2,10,north",
  "p2,2,1,20,north",
  "p3,3,3,30,north",
  "p4,7,7,40,middle",
  "p5,,6,99,middle",
  "p6,11,12,50,south",
  "p7,12,11,60,south",
  "p8,13,13,70,south",
  "",
].join("\n");

export const smallFileName = "small.csv";
export const smallRadius = 1.4; // between 6.40 and 7.81 raw units (see above), so the graph is the one worked out

/** Loads the small table (id column and the score outcome as the demo would name them) and builds it at radius 1.4. */
export async function loadSmallTable({ isDemo = false }: { isDemo?: boolean } = {}): Promise<void> {
  await act(async () => {
    await actions().loadText(smallCsv, { fileName: smallFileName, fileSize: smallCsv.length, isDemo }, { id: "id", outcomes: ["score"] });
    await actions().setRadius(smallRadius);
  });
}

/** Loads the small table without changing the suggested radius. */
export async function loadSmallTableAtSuggestedRadius(): Promise<void> {
  await act(async () => {
    await actions().loadText(smallCsv, { fileName: smallFileName, fileSize: smallCsv.length, isDemo: false }, { id: "id", outcomes: ["score"] });
  });
}
