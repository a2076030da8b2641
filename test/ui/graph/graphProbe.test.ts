import "../support/dom.ts";
import { afterEach, describe, expect, it } from "vitest";
import { installGraphProbe } from "../../../src/ui/graph/graphProbe.ts";
import type { ViewTransform } from "../../../src/ui/graph/useViewTransform.ts";

const host = window as unknown as { shoalGraph?: unknown };
const view: ViewTransform = {
  resolve: () => ({ k: 1, x: 0, y: 0 }), current: () => null, offset: () => ({ x: 0, y: 0 }), isFitted: () => true, set() {}, fit() {}, centreOn() {},
};
const install = (): (() => void) => installGraphProbe(() => null, view, { focused: () => null, drawings: () => 0, drawingMs: () => 0 });

afterEach(() => window.history.replaceState(null, "", "/"));

describe("the graph probe for the browser tests", () => {
  it("is not put on window when the page is opened without ?probe", () => {
    const remove = install();
    expect(host.shoalGraph).toBeUndefined();
    remove();
  });

  it("is put on window with ?probe (also ?probe&x=1), and taken away again", () => {
    window.history.replaceState(null, "", "/?x=1&probe");
    const remove = install();
    expect(host.shoalGraph).toBeDefined();
    remove();
    expect(host.shoalGraph).toBeUndefined();
  });
});
