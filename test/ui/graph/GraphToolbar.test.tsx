import "../support/dom.ts";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { expect, it, vi } from "vitest";
import { GraphToolbar, type GraphToolbarProps } from "../../../src/ui/graph/GraphToolbar.tsx";

function props(overrides: Partial<GraphToolbarProps> = {}): GraphToolbarProps {
  return {
    onFit: vi.fn(), onZoom: vi.fn(), zoomStep: 1.5, lassoMode: false, onLassoMode: vi.fn(), layoutSeed: 3, onNewLayout: vi.fn(),
    pinned: 0, onUnpinAll: vi.fn(), edgeWidthByShared: false, onEdgeWidthByShared: vi.fn(), ...overrides,
  };
}

it("F fits from anywhere outside a text field, and not while typing in one", async () => {
  const p = props();
  render(
    <>
      <GraphToolbar {...p} />
      <input aria-label="elsewhere" />
    </>,
  );
  const user = userEvent.setup();
  await user.keyboard("f");
  expect(p.onFit).toHaveBeenCalledTimes(1);
  await user.click(screen.getByRole("textbox", { name: "elsewhere" }));
  await user.keyboard("f");
  expect(p.onFit).toHaveBeenCalledTimes(1);
});

it("every control is a button or a box reachable with Tab, in order: Fit, zoom in, zoom out, Lasso, New layout, (Unpin all disabled), the edge-width box", async () => {
  render(<GraphToolbar {...props()} />);
  const user = userEvent.setup();
  const reached: string[] = [];
  for (let k = 0; k < 6; ++k) {
    await user.tab();
    reached.push(document.activeElement?.getAttribute("aria-label") ?? document.activeElement?.textContent ?? "");
  }
  expect(reached).toEqual(["Fit F", "zoom in", "zoom out", "Lasso", "New layout #3", ""]);
  expect(document.activeElement).toBe(screen.getByRole("checkbox", { name: "Edge width by shared rows" }));
});

it("zoom in and out pass 1.5 and 1/1.5; Lasso says whether it is pressed and toggles; Unpin all counts the pins", async () => {
  const p = props({ lassoMode: true, pinned: 2 });
  render(<GraphToolbar {...p} />);
  const user = userEvent.setup();
  await user.click(screen.getByRole("button", { name: "zoom in" }));
  await user.click(screen.getByRole("button", { name: "zoom out" }));
  expect(p.onZoom).toHaveBeenNthCalledWith(1, 1.5);
  expect(p.onZoom).toHaveBeenNthCalledWith(2, 1 / 1.5);
  expect(screen.getByRole("button", { name: "Lasso" }).getAttribute("aria-pressed")).toBe("true");
  await user.click(screen.getByRole("button", { name: "Lasso" }));
  expect(p.onLassoMode).toHaveBeenCalledWith(false);
  await user.click(screen.getByRole("button", { name: "Unpin all (2)" }));
  expect(p.onUnpinAll).toHaveBeenCalledTimes(1);
});
