import "./support/dom.ts";
import { render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { expect, it } from "vitest";
import { metricNames } from "../../src/core/index.ts";
import { workbenchStore } from "../../src/state/store.ts";
import { CoverControls } from "../../src/ui/panels/CoverControls.tsx";
import { loadSmallTable, loadSmallTableAtSuggestedRadius, smallRadius } from "./support/smallTable.ts";

const radiusField = (): HTMLInputElement => screen.getByRole("spinbutton", { name: "Radius" });

it("typing 1.4 in the radius field and pressing Enter rebuilds at radius 1.4", async () => {
  const user = userEvent.setup();
  render(<CoverControls />);
  await loadSmallTableAtSuggestedRadius();
  const suggested = workbenchStore.getState().radius;
  expect(suggested).not.toBe(smallRadius);
  expect(radiusField().value).toBe(String(suggested));
  await user.clear(radiusField());
  await user.type(radiusField(), "1.4{Enter}");
  await waitFor(() => expect(workbenchStore.getState().result?.params.radius).toBe(1.4));
  expect(workbenchStore.getState().radius).toBe(1.4);
  expect(workbenchStore.getState().result?.landmarks.length).toBe(3); // three nodes at 1.4, worked by hand in smallTable.ts
  expect(radiusField().value).toBe("1.4");
});

it.each(["0", "-1", "abc"])("the radius field rejects %j on Enter and shows the old radius 1.4 again", async (typed) => {
  const user = userEvent.setup();
  render(<CoverControls />);
  await loadSmallTable();
  const before = workbenchStore.getState().result;
  await user.clear(radiusField());
  await user.type(radiusField(), `${typed}{Enter}`);
  expect(radiusField().value).toBe(String(smallRadius));
  expect(workbenchStore.getState().radius).toBe(smallRadius);
  expect(workbenchStore.getState().build.state).toBe("done");
  expect(workbenchStore.getState().result).toBe(before); // no rebuild was started
});

it("the metric select offers Euclidean, selected by default, among one option per registered metric", () => {
  render(<CoverControls />);
  const metric = screen.getByRole("combobox", { name: "Metric" });
  const options = within(metric).getAllByRole("option") as HTMLOptionElement[];
  expect(options.map((o) => o.value)).toEqual(metricNames);
  expect(within(metric).getByRole("option", { name: "Euclidean" })).toBeTruthy();
  expect((metric as HTMLSelectElement).value).toBe("euclidean");
});

it("the seed field is disabled in file order and enabled after choosing 'greedy, seeded shuffle'", async () => {
  const user = userEvent.setup();
  render(<CoverControls />);
  await loadSmallTable();
  const seed = screen.getByRole("spinbutton", { name: "Seed" }) as HTMLInputElement;
  const order = screen.getByRole("combobox", { name: "Landmark order" });
  expect((order as HTMLSelectElement).value).toBe("greedy-file-order");
  expect(seed.disabled).toBe(true);
  await user.selectOptions(order, "greedy, seeded shuffle");
  expect(seed.disabled).toBe(false);
  await waitFor(() => expect(workbenchStore.getState().result?.params.landmarks).toBe("greedy-shuffled"));
});

it("the button back to the default radius is labelled 'Default radius' and no control says 'Suggest'", () => {
  render(<CoverControls />);
  expect(screen.getByRole("button", { name: "Default radius" })).toBeTruthy();
  expect(screen.queryByText(/suggest/i)).toBeNull();
});

it("one line under the radius says its units, and it follows the scaling and the metric", async () => {
  const user = userEvent.setup();
  render(<CoverControls />);
  await loadSmallTable();
  const units = (): string => document.getElementById(radiusField().getAttribute("aria-describedby")!)!.textContent!;
  expect(units()).toBe("Radius units: standard deviations of each feature; straight-line distance, after weights."); // z-score and Euclidean, the defaults
  await user.selectOptions(screen.getByRole("combobox", { name: "Scaling" }), "min–max [0, 1]");
  expect(units()).toBe("Radius units: shares of each feature's range (0 to 1); straight-line distance, after weights.");
  await user.selectOptions(screen.getByRole("combobox", { name: "Metric" }), "cosine (1 − cos)");
  expect(units()).toBe("Radius units: none; the distance is 1 − cosine of the angle between rows, from 0 to 2, whatever the scaling.");
});

it("one line under the landmark order says what a landmark is", () => {
  render(<CoverControls />);
  const order = screen.getByRole("combobox", { name: "Landmark order" });
  expect(document.getElementById(order.getAttribute("aria-describedby")!)!.textContent).toBe("Landmark: a row chosen as a centre; its ball is every row within the radius of it, and every row lies in at least one ball.");
});
