import "./support/dom.ts";
import { act, render, screen } from "@testing-library/react";
import { expect, it } from "vitest";
import { actions } from "../../src/state/actions.ts";
import { workbenchStore } from "../../src/state/store.ts";
import { BuildSummary } from "../../src/ui/panels/BuildSummary.tsx";

const csv = "site,x\nnorth,1\nsouth,2\nnorth,3\neast,4\n";

it("a recipe whose only features are one-hot columns shows no 'Choose at least one feature column' message", async () => {
  render(<BuildSummary />);
  await act(async () => {
    await actions().loadText(csv, { fileName: "sites.csv", fileSize: csv.length, isDemo: false });
    await actions().setRole("x", "ignore");
    await actions().setRole("site", "feature");
  });
  expect(workbenchStore.getState().roles).toMatchObject({ site: "feature", x: "ignore" });
  expect(screen.queryByText(/Choose at least one feature column/)).toBeNull();
});

it("a recipe with no feature at all still shows 'Choose at least one feature column'", async () => {
  render(<BuildSummary />);
  await act(async () => {
    await actions().loadText(csv, { fileName: "sites.csv", fileSize: csv.length, isDemo: false });
    await actions().setRole("x", "ignore");
  });
  expect(screen.getByText(/Choose at least one feature column/)).toBeTruthy();
});
