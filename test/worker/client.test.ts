import { describe, expect, it } from "vitest";
import { createWorkerClient } from "../../src/worker/client.ts";
import type { Progress } from "../../src/worker/protocol.ts";

// In Node there is no global Worker, so the client runs the same handler in this thread.
describe("worker client without a Worker (in-thread fallback)", () => {
  it("numbers requests from 1 and resolves each with its own answer", async () => {
    const client = createWorkerClient();
    const [loaded, radius] = await Promise.all([
      client.send({ type: "load", source: { kind: "text", text: "x\n1\n2\n4\n" }, options: {} }),
      client.send({ type: "suggestRadius", params: { features: ["x"], metric: "euclidean", scale: "zscore" } }),
    ]);
    expect(loaded).toMatchObject({ id: 1, type: "loaded" });
    expect(radius).toMatchObject({ id: 2, type: "radius" });
  });

  it("routes progress reports of a build to that request's callback before the answer", async () => {
    const client = createWorkerClient();
    await client.send({ type: "load", source: { kind: "text", text: "x\n1\n2\n4\n" }, options: {} });
    const reports: Progress[] = [];
    const answer = await client.send(
      { type: "build", params: { features: ["x"], scale: "zscore", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 } },
      (p) => reports.push(p),
    );
    expect(answer).toMatchObject({ id: 2, type: "built" });
    expect(reports.map((r) => r.phase).slice(0, 4)).toEqual(["scale", "landmarks", "members", "edges"]);
    expect(reports.every((r) => r.id === 2)).toBe(true);
  });

  it("answers a failing request with a failed answer instead of rejecting", async () => {
    const answer = await createWorkerClient().send({ type: "suggestRadius", params: { features: ["x"], metric: "euclidean", scale: "zscore" } });
    expect(answer).toEqual({ id: 1, type: "failed", message: "no table is loaded" });
  });
});
