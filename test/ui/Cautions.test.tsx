import "./support/dom.ts";
import { render, screen } from "@testing-library/react";
import { expect, it } from "vitest";
import { App } from "../../src/ui/App.tsx";
import { loadSmallTable } from "./support/smallTable.ts";

const cautionText = (): string => screen.getByRole("contentinfo", { name: "cautions" }).textContent ?? "";

function expectEveryCaution(text: string): void {
  expect(text).toMatch(/exploratory, not causal/i);
  expect(text).toMatch(/radius/);
  expect(text).toMatch(/metric/);
  expect(text).toMatch(/scaling/);
  expect(text).toMatch(/multiple comparison/);
  expect(text).toMatch(/data-protection/);
  expect(text).toMatch(/qualified review/);
}

it("the cautions footer is on screen before any table is loaded and names every caution", () => {
  render(<App openDemo={false} />);
  expectEveryCaution(cautionText());
});

it("the cautions footer stays on screen with a built graph", async () => {
  render(<App openDemo={false} />);
  await loadSmallTable();
  expect(screen.getByRole("img", { name: /cover graph with 3 nodes and 2 edges/ })).toBeTruthy();
  expectEveryCaution(cautionText());
});
