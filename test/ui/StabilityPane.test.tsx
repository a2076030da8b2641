import "./support/dom.ts";
import { act, render, screen, within } from "@testing-library/react";
import { expect, it } from "vitest";
import { actions } from "../../src/state/actions.ts";
import { workbenchStore } from "../../src/state/store.ts";
import { StabilityPane } from "../../src/ui/panels/StabilityPane.tsx";
import { loadSmallTable } from "./support/smallTable.ts";

async function sweptSmallTable(): Promise<void> {
  await loadSmallTable();
  await act(async () => {
    await actions().runSweep();
  });
}

it("beside 'Rebuild with other seeds' one line says the seed rebuilds always use the seeded shuffle, from the current seed 1", async () => {
  render(<StabilityPane />);
  await loadSmallTable();
  const button = screen.getByRole("button", { name: "Rebuild with other seeds" });
  const note = document.getElementById(button.getAttribute("aria-describedby")!)!.textContent!.replace(/\s+/g, " ");
  // seeds seed, seed + 1, … with the "greedy-shuffled" rule (src/core/stability/seedStability.ts); the seed starts at 1
  expect(note).toBe("The seed rebuilds always use the greedy, seeded shuffle order (seeds 1, 2, …), whatever landmark order is chosen above.");
});

it("after a sweep the plateau middle is called 'plateau middle' in the radius list and the notes, and nothing on the pane says 'suggest'", async () => {
  render(<StabilityPane />);
  await sweptSmallTable();
  const sweep = workbenchStore.getState().sweep!;
  const list = screen.getByRole("combobox", { name: "Rebuild at a swept radius" });
  const marked = within(list).getAllByRole("option").filter((o) => o.textContent!.includes("plateau middle"));
  expect(marked).toHaveLength(1);
  expect((marked[0] as HTMLOptionElement).value).toBe(String(sweep.suggestion!.radius));
  expect(screen.getByTestId("stability-pane").textContent).not.toMatch(/suggest/i);
});

it("the engine's plateau rule is shown as its own sentence, capitalised and ending in a period", async () => {
  render(<StabilityPane />);
  await sweptSmallTable();
  const rule = workbenchStore.getState().sweep!.suggestionRule.trim();
  const line = screen.getByTestId("plateau-rule").textContent!;
  expect(line.startsWith(`Plateau middle: ${rule[0]!.toUpperCase()}${rule.slice(1)}`)).toBe(true);
  expect(line.endsWith(".")).toBe(true);
});

it("the swept list counts components, not b0, in each radius's line", async () => {
  render(<StabilityPane />);
  await sweptSmallTable();
  const first = within(screen.getByRole("combobox", { name: "Rebuild at a swept radius" })).getAllByRole("option")[1]!.textContent!;
  const sweep = workbenchStore.getState().sweep!;
  expect(first).toContain(`· ${sweep.figures.nodes[0]} nodes · ${sweep.figures.b0[0]} components ·`);
});

it("with a region selected, the sweep's notes explain region match as the Jaccard index, shared rows over rows in either", async () => {
  render(<StabilityPane />);
  await loadSmallTable();
  await act(async () => {
    await actions().selectNode(0, true);
  });
  await act(async () => {
    await actions().runSweep();
  });
  expect(workbenchStore.getState().region).not.toBeNull();
  const notes = screen.getByRole("list", { name: "how to read the sweep" }).textContent!;
  expect(notes).toContain("Region match: the Jaccard index of the region's rows and the best-matching connected node set, shared rows over rows in either (1 = the same rows).");
});

it("the seed summary's rows are nodes, edges, 'components (b0)' and 'loops (b1)'", async () => {
  render(<StabilityPane />);
  await loadSmallTable();
  await act(async () => {
    await actions().runSeedStability();
  });
  const summary = screen.getByTestId("seed-summary");
  expect(within(summary).getAllByRole("rowheader").map((h) => h.textContent)).toEqual(["nodes", "edges", "components (b0)", "loops (b1)"]);
});
