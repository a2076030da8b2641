import "./support/dom.ts";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { InspectorTabs } from "../../src/ui/panels/InspectorTabs.tsx";
import { loadSmallTable } from "./support/smallTable.ts";

describe("side pane tabs", () => {
  it("has a Hotspots tab after Stability, and choosing it shows the hotspot pane", async () => {
    await loadSmallTable();
    render(<InspectorTabs />);
    expect(screen.getAllByRole("tab").map((t) => t.textContent)).toEqual(["Node", "Region", "Stability", "Hotspots", "How to read"]);
    await userEvent.setup().click(screen.getByRole("tab", { name: "Hotspots" }));
    expect(screen.getByTestId("hotspot-pane")).toBeTruthy();
    expect(screen.getByRole("tab", { name: "Hotspots" }).getAttribute("aria-selected")).toBe("true");
  });
});
