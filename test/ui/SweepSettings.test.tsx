import "./support/dom.ts";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { expect, it } from "vitest";
import { initialState, workbenchStore } from "../../src/state/store.ts";
import { SweepSettings } from "../../src/ui/panels/SweepSettings.tsx";

const field = (name: string): HTMLInputElement => screen.getByRole("spinbutton", { name });
const errorOf = (input: HTMLInputElement): string | null => {
  const id = input.getAttribute("aria-describedby");
  return id ? (document.getElementById(id)?.textContent ?? null) : null;
};

it("a step count of 1 is ignored, stays in the field, and is explained beside it for screen readers", async () => {
  const user = userEvent.setup();
  render(<SweepSettings />);
  const steps = field("Steps (log-spaced)");
  await user.clear(steps);
  await user.type(steps, "1");
  expect(steps.value).toBe("1");
  expect(steps.getAttribute("aria-invalid")).toBe("true");
  expect(errorOf(steps)).toBe("ignored: enter a whole number from 2 to 200");
  expect(workbenchStore.getState().sweepSteps).toBe(initialState.sweepSteps);
});

it("a step count of 30 is applied and clears the error", async () => {
  const user = userEvent.setup();
  render(<SweepSettings />);
  const steps = field("Steps (log-spaced)");
  await user.clear(steps);
  await user.type(steps, "30");
  expect(workbenchStore.getState().sweepSteps).toBe(30);
  expect(steps.getAttribute("aria-invalid")).toBe("false");
  expect(errorOf(steps)).toBeNull();
});

it("a smallest radius of -1 is ignored on leaving the field, which keeps showing -1 with its error", async () => {
  const user = userEvent.setup();
  render(<SweepSettings />);
  const min = field("Smallest radius");
  await user.type(min, "-1");
  await user.tab();
  expect(min.value).toBe("-1");
  expect(min.getAttribute("aria-invalid")).toBe("true");
  expect(errorOf(min)).toBe("ignored: enter a positive number, or leave empty for the range from the data");
  expect(workbenchStore.getState().sweepMin).toBeNull(); // still the default range
});

it("a largest radius of 0.5 below a smallest of 2 is ignored and named on the largest radius's field", async () => {
  const user = userEvent.setup();
  render(<SweepSettings />);
  await user.type(field("Smallest radius"), "2");
  await user.type(field("Largest radius"), "0.5");
  await user.tab();
  expect(errorOf(field("Largest radius"))).toBe("ignored: must be larger than the smallest radius");
  expect(workbenchStore.getState().sweepMax).toBeNull();
});

it("a seed count of 101 is ignored and explained; 12 is applied", async () => {
  const user = userEvent.setup();
  render(<SweepSettings />);
  const seeds = field("Seeds");
  await user.clear(seeds);
  await user.type(seeds, "101");
  expect(seeds.value).toBe("101");
  expect(errorOf(seeds)).toBe("ignored: enter a whole number from 2 to 100");
  expect(workbenchStore.getState().seedCount).toBe(initialState.seedCount);
  await user.clear(seeds);
  await user.type(seeds, "12");
  expect(workbenchStore.getState().seedCount).toBe(12);
});
