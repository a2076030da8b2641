import "./support/dom.ts";
import { fireEvent, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { unzipSync, strFromU8 } from "fflate";
import { afterEach, beforeEach, expect, it, vi } from "vitest";
import { ExportButton } from "../../src/ui/panels/ExportButton.tsx";
import { loadSmallTable, smallRadius } from "./support/smallTable.ts";

// jsdom has no object URLs and does not navigate on click: capture the blob and the link instead
const saved = { createObjectURL: URL.createObjectURL, revokeObjectURL: URL.revokeObjectURL };
let blobs: Blob[] = [];
let links: { download: string; href: string }[] = [];
const revoked: string[] = [];

beforeEach(() => {
  blobs = [];
  links = [];
  revoked.length = 0;
  URL.createObjectURL = (blob: Blob) => {
    blobs.push(blob);
    return `blob:shoal-test/${blobs.length}`;
  };
  URL.revokeObjectURL = (url: string) => void revoked.push(url);
  vi.spyOn(HTMLAnchorElement.prototype, "click").mockImplementation(function (this: HTMLAnchorElement) {
    links.push({ download: this.download, href: this.getAttribute("href") ?? "" });
  });
});

afterEach(() => {
  vi.useRealTimers();
  vi.restoreAllMocks();
  URL.createObjectURL = saved.createObjectURL;
  URL.revokeObjectURL = saved.revokeObjectURL;
});

it("clicking it saves small-cover-r1.4.zip whose bytes unzip to nodes.csv, members.csv, edges.csv, summary.json and recipe.json", async () => {
  render(<ExportButton />);
  await loadSmallTable();
  // fake setTimeout for the click alone: the download revokes its URL 10 s later, which must not
  // outlive the test (user-event's own waits need real timers, so this click is a plain event)
  vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout"] });
  fireEvent.click(screen.getByRole("button", { name: "Export tables (.zip) contains row-level data" }));
  await vi.waitFor(() => expect(links).toHaveLength(1)); // the worker writes the zip

  expect(links).toHaveLength(1);
  expect(links[0]!.download).toBe(`small-cover-r${smallRadius}.zip`);
  expect(links[0]!.download.endsWith(".zip")).toBe(true);
  expect(links[0]!.href).toBe("blob:shoal-test/1");
  expect(blobs).toHaveLength(1);
  expect(blobs[0]!.type).toBe("application/zip");

  const files = unzipSync(new Uint8Array(await blobs[0]!.arrayBuffer()));
  expect(Object.keys(files).sort()).toEqual(["edges.csv", "members.csv", "nodes.csv", "recipe.json", "summary.json"]);
  expect(JSON.parse(strFromU8(files["recipe.json"]!))).toMatchObject({ shoalRecipe: 1, radius: smallRadius, input: { name: "small.csv" } }); // the recipe of what was exported
  const summary = JSON.parse(strFromU8(files["summary.json"]!)) as { nodes: number; edges: number; components: number; rows: { dropped: number } };
  // 3 nodes, 2 edges, 1 component and 1 dropped row, worked by hand in smallTable.ts
  expect([summary.nodes, summary.edges, summary.components, summary.rows.dropped]).toEqual([3, 2, 1, 1]);
  expect(strFromU8(files["edges.csv"]!)).toBe("source,target,shared\n1,2,1\n2,3,2\n"); // p3 shared by 1–2; p6, p7 by 2–3

  expect(revoked).toEqual([]);
  vi.advanceTimersByTime(10_000);
  expect(revoked).toEqual(["blob:shoal-test/1"]); // the object URL is released after 10 s
});

it("is disabled, and saves nothing, before a graph is built", async () => {
  const user = userEvent.setup();
  render(<ExportButton />);
  const button = screen.getByRole("button", { name: "Export tables (.zip) contains row-level data" }) as HTMLButtonElement;
  expect(button.disabled).toBe(true);
  await user.click(button);
  expect(links).toEqual([]);
  expect(blobs).toEqual([]);
});
