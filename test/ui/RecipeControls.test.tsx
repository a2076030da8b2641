import "./support/dom.ts";
import { act, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, beforeEach, expect, it, vi } from "vitest";
import { workbenchStore } from "../../src/state/store.ts";
import { RecipeControls } from "../../src/ui/panels/RecipeControls.tsx";
import { loadSmallTable, smallRadius } from "./support/smallTable.ts";

const saved = { createObjectURL: URL.createObjectURL, revokeObjectURL: URL.revokeObjectURL };
let blobs: Blob[] = [];
let links: string[] = [];

beforeEach(() => {
  blobs = [];
  links = [];
  URL.createObjectURL = (blob: Blob) => {
    blobs.push(blob);
    return `blob:shoal-test/${blobs.length}`;
  };
  URL.revokeObjectURL = () => {};
  vi.spyOn(HTMLAnchorElement.prototype, "click").mockImplementation(function (this: HTMLAnchorElement) {
    links.push(this.download);
  });
});

afterEach(() => {
  vi.restoreAllMocks();
  URL.createObjectURL = saved.createObjectURL;
  URL.revokeObjectURL = saved.revokeObjectURL;
});

const openRecipeFile = async (text: string): Promise<void> => {
  const file = new File([text], "r.recipe.json", { type: "application/json" });
  await act(async () => {
    fireEvent.change(screen.getByTestId("recipe-input"), { target: { files: [file] } });
    await new Promise((resolve) => setTimeout(resolve, 50)); // file.text(), then the rebuild in the in-thread worker
  });
};

it("Save recipe downloads small.recipe.json with the radius on screen; Open recipe applies a changed one", async () => {
  render(<RecipeControls />);
  await loadSmallTable();
  fireEvent.click(screen.getByRole("button", { name: "Save recipe" }));
  expect(links).toEqual(["small.recipe.json"]);
  const recipe = JSON.parse(await blobs[0]!.text());
  expect(recipe.radius).toBe(smallRadius);

  await openRecipeFile(JSON.stringify({ ...recipe, metric: "chebyshev", radius: 2 }));
  expect(screen.getByTestId("recipe-status").textContent).toMatch(/^Recipe applied/);
  expect(workbenchStore.getState()).toMatchObject({ metric: "chebyshev", radius: 2 });
});

it("a recipe of other bytes shows both fingerprints and applies only on Apply anyway", async () => {
  render(<RecipeControls />);
  await loadSmallTable();
  const recipe = JSON.parse((await import("../../src/state/actions.ts")).actions().recipeFile()!.text);
  const other = { ...recipe, input: { name: "other.csv", bytes: 5, sha256: "f".repeat(64) }, radius: 3 };
  await openRecipeFile(JSON.stringify(other));
  const warning = screen.getByTestId("recipe-other-file");
  expect(warning.textContent).toContain(`other.csv (sha256 ${"f".repeat(64)}, 5 bytes)`);
  expect(warning.textContent).toContain(`small.csv (sha256 ${recipe.input.sha256}`);
  expect(workbenchStore.getState().radius).toBe(smallRadius);
  await act(async () => {
    fireEvent.click(screen.getByRole("button", { name: "Apply anyway" }));
    await new Promise((resolve) => setTimeout(resolve, 50));
  });
  expect(workbenchStore.getState().radius).toBe(3);
});

it("a damaged recipe is refused with its reason and changes nothing", async () => {
  render(<RecipeControls />);
  await loadSmallTable();
  await openRecipeFile('{"shoalRecipe": 1, "radius": -1}');
  expect(screen.getByRole("alert").textContent).toMatch(/^Recipe not applied: invalid recipe: missing field: writtenBy; /);
  expect(workbenchStore.getState().radius).toBe(smallRadius);
});
