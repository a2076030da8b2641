import "../support/dom.ts";
import { act, renderHook } from "@testing-library/react";
import { expect, it } from "vitest";
import type { CoverResult } from "../../../src/core/index.ts";
import { spiralPlacement } from "../../../src/ui/graph/spiralPlacement.ts";
import { useForceLayout, type Layout } from "../../../src/ui/graph/useForceLayout.ts";

/** Just what the layout reads of a result: a path of four nodes of 3 rows each, sharing one row per edge (invented). */
function pathResult(): CoverResult {
  return {
    landmarks: Uint32Array.of(0, 3, 6, 9),
    members: { offsets: Uint32Array.of(0, 3, 6, 9, 12) },
    edges: { source: Uint32Array.of(0, 1, 2), target: Uint32Array.of(1, 2, 3), shared: Uint32Array.of(1, 1, 1) },
  } as unknown as CoverResult;
}

const settle = (): Promise<void> => act(() => new Promise<void>((resolve) => setTimeout(resolve, 20)));

interface Props { result: CoverResult | null; onTick: (layout: Layout) => void; seed: number }

it("layout 1 starts every node on d3-force's spiral in node order (the first call of onTick, before any step)", async () => {
  const ticks: Layout[] = [];
  const first: { x: number; y: number }[][] = [];
  const result = pathResult();
  renderHook(() => useForceLayout(result, (l) => (ticks.push(l), first.length === 0 && first.push(l.nodes.map((n) => ({ x: n.x, y: n.y })))), true, 1));
  await settle();
  const spiral = spiralPlacement(4, 1);
  expect(first[0]).toEqual([0, 1, 2, 3].map((k) => ({ x: spiral[2 * k], y: spiral[2 * k + 1] })));
});

it("a new onTick (what a colour change brings) keeps the same layout and its pins; a new seed keeps the pins; a new result drops them", async () => {
  const result = pathResult();
  const { result: hook, rerender } = renderHook((props: Props) => useForceLayout(props.result, props.onTick, true, props.seed), {
    initialProps: { result, onTick: () => {}, seed: 1 },
  });
  await settle();
  const layout = hook.current.layout.current!;
  act(() => hook.current.controls.pin(2, 100, -50));
  expect(hook.current.pinned).toBe(1);
  rerender({ result, onTick: () => {}, seed: 1 });
  await settle();
  expect(hook.current.layout.current).toBe(layout); // not laid out again
  expect(layout.nodes[2]).toMatchObject({ x: 100, y: -50, fx: 100, fy: -50 });

  rerender({ result, onTick: () => {}, seed: 2 });
  await settle();
  const relaid = hook.current.layout.current!;
  expect(relaid).not.toBe(layout);
  expect(relaid.nodes[2]).toMatchObject({ x: 100, y: -50, fx: 100, fy: -50 });
  expect(hook.current.pinned).toBe(1);
  const spiral = spiralPlacement(4, 2);
  expect(relaid.nodes[0]).toMatchObject({ x: spiral[0], y: spiral[1] }); // paused: still where layout 2 starts it

  act(() => hook.current.controls.unpinAll());
  expect(hook.current.pinned).toBe(0);
  expect(relaid.nodes[2]!.fx).toBeNull();
  act(() => hook.current.controls.pin(1, 5, 5));
  rerender({ result: pathResult(), onTick: () => {}, seed: 2 });
  await settle();
  expect(hook.current.pinned).toBe(0);
  expect(hook.current.layout.current!.nodes.every((n) => n.fx == null)).toBe(true);
});
