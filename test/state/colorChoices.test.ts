import { describe, expect, it } from "vitest";
import { createActions } from "../../src/state/actions.ts";
import { levelsColor, regionColor, selectLevelColumns } from "../../src/state/colorChoices.ts";
import { selectNodeFill } from "../../src/state/selectors.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import { assertClose } from "../assertClose.ts";
import { inThreadClient, noDemo, steppingClock } from "./support.ts";

/**
 * The small table of test/ui/support/smallTable.ts (worked there by hand at radius 1.4): node 1 =
 * {p1, p2, p3}, node 2 = {p3, p4, p6, p7}, node 3 = {p6, p7, p8}; p5 is left out. `grade` is a
 * class code with 3 values.
 */
const csv = [
  "id,x,y,grade,site",
  "p1,1,2,0,north",
  "p2,2,1,0,north",
  "p3,3,3,1,north",
  "p4,7,7,1,middle",
  "p5,,6,2,middle",
  "p6,11,12,2,south",
  "p7,12,11,2,south",
  "p8,13,13,2,south",
  "",
].join("\n");

async function built(text = csv) {
  const store = createWorkbenchStore();
  const actions = createActions(store, { client: inThreadClient(), fetchDemo: noDemo, now: steppingClock() });
  await actions.loadText(text, { fileName: "small.csv", fileSize: text.length, isDemo: false }, { id: "id" });
  store.setState({ roles: { ...store.getState().roles, grade: "outcome", site: "ignore" } });
  await actions.setRadius(1.4);
  return { store, actions };
}

describe("colour choices", () => {
  it("colour by region: the region {p3, p4} fills nodes 1, 2, 3 with shares 1/3, 2/4, 0 (worked by hand)", async () => {
    const { store } = await built();
    const region = { id: 7, name: "pair", rows: Uint32Array.of(2, 3) };
    store.setState({ regions: [region], colorBy: regionColor(7) });
    const fill = selectNodeFill(store.getState())!;
    expect(fill.kind).toBe("sequential");
    if (fill.kind !== "sequential") return;
    assertClose(Array.from(fill.values), [1 / 3, 2 / 4, 0], { absolute: 1e-15 }); // worked by hand
    expect(fill.caption).toBe("node share of rows in pair");
  });

  it("colour by a deleted region falls back to a plain fill", async () => {
    const { store } = await built();
    store.setState({ colorBy: regionColor(99) });
    expect(selectNodeFill(store.getState())).toBeNull();
  });

  it("grade as categories: node majorities are levels 0, 1, 2 of '0', '1', '2' (node 2 has 1, 1, 2, 2: a tie goes to the lower level)", async () => {
    const { store } = await built();
    store.setState({ colorBy: levelsColor("grade") });
    const fill = selectNodeFill(store.getState())!;
    expect(fill.kind).toBe("categorical");
    if (fill.kind !== "categorical") return;
    expect(fill.levels).toEqual(["0", "1", "2"]);
    expect(Array.from(fill.level)).toEqual([0, 1, 2]); // by hand: {0, 0, 1} → 0; {1, 1, 2, 2} tie → 1 (first level); {2, 2, 2} → 2
  });

  it("numeric as categories is offered only for columns with at most 12 distinct values", async () => {
    const wide = ["id,x,y,big", ...Array.from({ length: 13 }, (_, i) => `r${i},${i % 3},${i % 2},${i}`), ""].join("\n");
    const { store } = await built(wide);
    expect(selectLevelColumns(store.getState()).map((c) => c.name)).toEqual(["x", "y"]); // big has 13 distinct values (0..12)
  });
});
