import "./support/dom.ts";
import { fireEvent, render, screen } from "@testing-library/react";
import { afterEach, beforeEach, expect, it, vi } from "vitest";
import { workbenchStore } from "../../src/state/store.ts";
import { registerPictureSource } from "../../src/ui/graph/pictureSource.ts";
import type { Layout, LayoutNode } from "../../src/ui/graph/useForceLayout.ts";
import { SavePicture } from "../../src/ui/panels/SavePicture.tsx";
import { loadSmallTable, smallRadius } from "./support/smallTable.ts";

// jsdom has no object URLs and does not navigate on click: capture the blob and the link instead
const saved = { createObjectURL: URL.createObjectURL, revokeObjectURL: URL.revokeObjectURL };
let blobs: Blob[] = [];
let links: string[] = [];

beforeEach(() => {
  blobs = [];
  links = [];
  URL.createObjectURL = (blob: Blob) => `blob:shoal-test/${blobs.push(blob)}`;
  URL.revokeObjectURL = () => {};
  vi.spyOn(HTMLAnchorElement.prototype, "click").mockImplementation(function (this: HTMLAnchorElement) {
    links.push(this.download);
  });
});

afterEach(() => {
  vi.useRealTimers();
  vi.restoreAllMocks();
  URL.createObjectURL = saved.createObjectURL;
  URL.revokeObjectURL = saved.revokeObjectURL;
});

/** The small table's three nodes in a row, as a graph view would hold them (places made up; edges 1–2 and 2–3, smallTable.ts). */
function smallLayout(): Layout {
  const nodes: LayoutNode[] = [0, 1, 2].map((index) => ({ index, radius: 10, x: 40 * index, y: 0 }));
  return { nodes, links: [{ source: nodes[0]!, target: nodes[1]!, shared: 1 }, { source: nodes[1]!, target: nodes[2]!, shared: 2 }] };
}

it("with a graph on screen, Save SVG downloads small-graph-r1.4.svg: three circles and the caption of the build", async () => {
  render(<SavePicture />);
  await loadSmallTable();
  const canvas = document.createElement("canvas");
  Object.defineProperties(canvas, { clientWidth: { value: 600 }, clientHeight: { value: 400 } });
  const unregister = registerPictureSource({ layout: smallLayout, canvas: () => canvas });
  vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout"] }); // the download revokes its URL 10 s later
  fireEvent.click(screen.getByRole("button", { name: "Save SVG" }));
  await vi.waitFor(() => expect(links).toHaveLength(1));
  unregister();

  expect(links[0]).toBe(`small-graph-r${smallRadius}.svg`);
  expect(blobs[0]!.type).toBe("image/svg+xml");
  const svg = new DOMParser().parseFromString(await blobs[0]!.text(), "image/svg+xml");
  expect(svg.documentElement.getAttribute("width")).toBe("860"); // 600 + the 260 px legend column (legendSvg.ts)
  expect(svg.querySelectorAll("g.nodes circle").length).toBe(3); // three nodes, smallTable.ts
  const caption = Array.from(svg.querySelectorAll("g.caption text"), (t) => t.textContent);
  expect(caption[0]).toBe("file: small.csv");
  expect(caption.at(-1)).toBe(`nodes: 3; edges: 2; colour: ${workbenchStore.getState().colorBy ?? "none"}`); // 3 nodes, 2 edges: smallTable.ts
});

it("with no graph on screen it says so instead of saving", async () => {
  render(<SavePicture />);
  await loadSmallTable();
  fireEvent.click(screen.getByRole("button", { name: "Save SVG" }));
  expect((await screen.findByRole("alert")).textContent).toBe("Could not save the picture: no graph is drawn (raise the radius if it has too many nodes)");
  expect(links).toEqual([]);
});
