import { describe, expect, it } from "vitest";
import { assertClose } from "../../assertClose.ts";
import { clampScale, panView, pinchView, scaleRange, toScreen, toWorld, wheelFactor, zoomAround } from "../../../src/ui/graph/viewTransform.ts";

const view = Object.freeze({ k: 2, x: 10, y: -4 });

describe("world ↔ screen", () => {
  it("toScreen maps world (3, 5) to (16, 6) under k = 2, t = (10, −4) (2·3 + 10, 2·5 − 4; worked by hand)", () => {
    expect(toScreen(view, { x: 3, y: 5 })).toEqual({ x: 16, y: 6 });
  });

  it("toWorld maps screen (16, 6) back to (3, 5) (worked by hand)", () => {
    expect(toWorld(view, { x: 16, y: 6 })).toEqual({ x: 3, y: 5 });
  });

  it("toWorld inverts toScreen for an awkward scale (k = 0.37)", () => {
    const v = { k: 0.37, x: -123.4, y: 56.7 };
    const p = { x: 1234.5, y: -678.9 };
    assertClose(toWorld(v, toScreen(v, p)), p);
  });
});

describe("zoom and pan", () => {
  it("zoomAround doubles k and keeps the world point under (10, 20): t = (−10, −20) (the JSDoc example; worked by hand)", () => {
    expect(zoomAround({ k: 1, x: 0, y: 0 }, 2, { x: 10, y: 20 })).toEqual({ k: 2, x: -10, y: -20 });
  });

  it("zoomAround keeps the world point under the pointer where it was, for any factor", () => {
    const at = { x: 321.5, y: 87.25 };
    const before = toWorld(view, at);
    for (const factor of [0.5, 0.9, 1.1, 3]) assertClose(toWorld(zoomAround(view, factor, at), at), before);
  });

  it("zoomAround clamps k to the zoom range [0.01, 40] and still keeps the point under the pointer", () => {
    const at = { x: 50, y: 60 };
    const inMax = zoomAround(view, 1e6, at);
    expect(inMax.k).toBe(scaleRange.max);
    assertClose(toWorld(inMax, at), toWorld(view, at));
    expect(zoomAround(view, 1e-9, at).k).toBe(scaleRange.min);
  });

  it("zoomAround leaves the view as it is for a factor of 0, −1, NaN or ∞", () => {
    for (const factor of [0, -1, NaN, Infinity]) expect(zoomAround(view, factor, { x: 1, y: 1 })).toBe(view);
  });

  it("clampScale keeps 1 and clamps 100 to 40 and 0.001 to 0.01", () => {
    expect([clampScale(1), clampScale(100), clampScale(0.001)]).toEqual([1, 40, 0.01]);
  });

  it("panView moves t by (5, −7) and keeps k", () => {
    expect(panView(view, 5, -7)).toEqual({ k: 2, x: 15, y: -11 });
  });
});

describe("wheelFactor (d3-zoom 3.0's default wheel delta)", () => {
  it("a wheel of −500 px zooms in by 2 (2^(500 · 0.002); worked by hand)", () => {
    expect(wheelFactor(-500, 0, false)).toBe(2);
  });

  it("3 lines down zoom out by 2^−0.15 (0.05 per line; worked by hand)", () => {
    assertClose(wheelFactor(3, 1, false), 2 ** -0.15);
  });

  it("ctrl (a trackpad pinch) zooms ten times as fast: −50 px gives 2 (2^(50 · 0.002 · 10); worked by hand)", () => {
    expect(wheelFactor(-50, 0, true)).toBe(2);
  });
});

describe("pinchView", () => {
  it("fingers 10 px apart spreading to 20 px about a fixed left finger give k = 2, t = (0, 0) (the JSDoc example; worked by hand: world midpoint (5, 0) lands at (10, 0))", () => {
    expect(pinchView({ k: 1, x: 0, y: 0 }, { x: 0, y: 0 }, { x: 10, y: 0 }, { x: 0, y: 0 }, { x: 20, y: 0 })).toEqual({ k: 2, x: 0, y: 0 });
  });

  it("both fingers moving by (30, 40) pans by (30, 40) and keeps k", () => {
    const a = { x: 100, y: 100 };
    const b = { x: 200, y: 150 };
    const moved = pinchView(view, a, b, { x: 130, y: 140 }, { x: 230, y: 190 });
    assertClose(moved, { k: 2, x: 40, y: 36 }); // t + (30, 40): (10 + 30, −4 + 40), worked by hand
  });

  it("keeps the world points under the two fingers under them when the fingers move apart along their line", () => {
    const a = { x: 100, y: 100 };
    const b = { x: 200, y: 100 };
    const na = { x: 50, y: 100 };
    const nb = { x: 250, y: 100 };
    const moved = pinchView(view, a, b, na, nb);
    assertClose(toWorld(moved, na), toWorld(view, a));
    assertClose(toWorld(moved, nb), toWorld(view, b));
  });

  it("fingers that started at one point only pan (k stays 2)", () => {
    const p = { x: 5, y: 5 };
    expect(pinchView(view, p, p, { x: 6, y: 5 }, { x: 8, y: 5 }).k).toBe(2);
  });
});
