import "./support/dom.ts";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { expect, it } from "vitest";
import { InspectorTabs } from "../../src/ui/panels/InspectorTabs.tsx";

// The tabs pattern of the WAI-ARIA Authoring Practices: ArrowRight moves to the next tab, ArrowLeft to the previous, both wrapping.
it("ArrowLeft on the first tab (Node) moves to the last tab, How to read, and ArrowRight from there back to Node", async () => {
  render(<InspectorTabs />);
  const user = userEvent.setup();
  screen.getByRole("tab", { name: "Node" }).focus();
  await user.keyboard("{ArrowLeft}");
  expect(document.activeElement).toBe(screen.getByRole("tab", { name: "How to read" }));
  expect(screen.getByRole("tab", { name: "How to read" }).getAttribute("aria-selected")).toBe("true");
  await user.keyboard("{ArrowRight}");
  expect(document.activeElement).toBe(screen.getByRole("tab", { name: "Node" }));
});
