import { describe, expect, it } from "vitest";
import type { CoverParams } from "../../src/core/index.ts";
import { loadText, now } from "./answers.ts";
import { createHandler, transferables } from "../../src/worker/handle.ts";
import type { Answer, Progress, Request } from "../../src/worker/protocol.ts";

const csv = "name,x,y\na,0,0\nb,1,0\nc,0,1\nd,5,5\n";
const params: CoverParams = Object.freeze({ features: ["x", "y"], scale: "zscore", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 });
const ignore = (): void => {};

/** A handler with a table loaded. */
function loadedHandler(text = csv) {
  const handle = createHandler({ now: () => 0, progressInterval: 0 });
  const answer = now(handle(loadText(1, text), ignore));
  expect(answer.type).toBe("loaded");
  return handle;
}

const failure = (answer: Answer): string => {
  if (answer.type !== "failed") throw new Error(`expected a failed answer, got ${answer.type}`);
  return answer.message;
};

describe("worker handler: answers", () => {
  it("load answers 'loaded' with the request id and the parsed table", () => {
    const answer = now(createHandler()(loadText(7, csv), ignore));
    expect(answer).toMatchObject({ id: 7, type: "loaded" });
    if (answer.type !== "loaded") return;
    expect(answer.table.rows).toBe(4);
    expect(answer.table.columns.map((c) => [c.name, c.kind])).toEqual([["name", "text"], ["x", "numeric"], ["y", "numeric"]]);
  });

  it("suggestRadius answers 'radius' with a positive radius for the loaded table", () => {
    const answer = now(loadedHandler()({ id: 2, type: "suggestRadius", params: { features: ["x", "y"], metric: "euclidean", scale: "zscore" } }, ignore));
    expect(answer).toMatchObject({ id: 2, type: "radius" });
    if (answer.type === "radius") expect(answer.radius).toBeGreaterThan(0);
  });

  it("build answers 'built' with a cover result for the loaded table and the given parameters", () => {
    const answer = now(loadedHandler()({ id: 3, type: "build", params }, ignore));
    expect(answer).toMatchObject({ id: 3, type: "built" });
    if (answer.type !== "built") return;
    expect(answer.result.params).toEqual(params);
    expect(answer.result.rowsRead).toBe(4);
    expect(answer.result.landmarks.length).toBeGreaterThan(0);
    for (const ms of Object.values(answer.result.timings)) expect(ms).toBe(0); // the clock passed in stands still
  });

  it("builds use the latest loaded table", () => {
    const handle = loadedHandler();
    now(handle(loadText(2, "x,y\n1,2\n3,4\n"), ignore));
    const answer = now(handle({ id: 3, type: "build", params }, ignore));
    expect(answer.type === "built" && answer.result.rowsRead).toBe(2);
  });

  it("transferables lists the result's buffers once each for a built answer, and none otherwise", () => {
    const answer = now(loadedHandler()({ id: 3, type: "build", params }, ignore));
    const buffers = transferables(answer);
    expect(buffers.length).toBeGreaterThan(0);
    expect(new Set(buffers).size).toBe(buffers.length);
    if (answer.type === "built") expect(buffers).toContain(answer.result.members.items.buffer);
    expect(transferables({ id: 1, type: "failed", message: "x" })).toEqual([]);
  });
});

describe("worker handler: failures become clear failed answers", () => {
  it("a build before any load fails with 'no table is loaded'", () => {
    const handle = createHandler();
    expect(failure(now(handle({ id: 1, type: "build", params }, ignore)))).toBe("no table is loaded");
    expect(failure(now(handle({ id: 2, type: "suggestRadius", params }, ignore)))).toBe("no table is loaded");
  });

  it("an unknown feature column fails naming the column", () => {
    expect(failure(now(loadedHandler()({ id: 4, type: "build", params: { ...params, features: ["x", "z"] } }, ignore)))).toBe("unknown column: z");
  });

  it("a text feature column fails naming the column", () => {
    expect(failure(now(loadedHandler()({ id: 4, type: "build", params: { ...params, features: ["name"] } }, ignore)))).toBe("not a numeric column: name");
  });

  it("a bad radius fails naming the radius", () => {
    const handle = loadedHandler();
    expect(failure(now(handle({ id: 5, type: "build", params: { ...params, radius: -1 } }, ignore)))).toBe("invalid radius: -1");
    expect(failure(now(handle({ id: 6, type: "build", params: { ...params, radius: 0 } }, ignore)))).toBe("invalid radius: 0");
  });

  it("a file that cannot be read fails with the parser's message, keeping the request id", () => {
    expect(now(createHandler()(loadText(9, "x,y\n"), ignore))).toEqual({ id: 9, type: "failed", message: "the file has a header but no data records" });
  });

  it("an unknown request type fails with 'unknown request'", () => {
    const answer = now(createHandler()({ id: 3, type: "explode" } as unknown as Request, ignore));
    expect(failure(answer)).toMatch(/^unknown request: /);
    expect(answer.id).toBe(3);
  });
});

describe("worker handler: progress", () => {
  // 5000 rows x = 0..4999 (z-score spacing 1/sd, sd ≈ 1443.5) with r = 0.05 give about 70 landmarks,
  // so greedyNet reports after 4096 rows and ballMembership after 64 landmarks.
  const rows = Array.from({ length: 5000 }, (_, i) => String(i)).join("\n");
  const progress = (): Progress[] => {
    const reports: Progress[] = [];
    const answer = now(loadedHandler(`x\n${rows}\n`)({ id: 11, type: "build", params: { ...params, features: ["x"], radius: 0.05 } }, (p) => reports.push(p)));
    expect(answer.type).toBe("built");
    return reports;
  };

  it("reports carry the request id and fractions in [0, 1]", () => {
    for (const report of progress()) {
      expect(report).toMatchObject({ id: 11, type: "progress" });
      expect(report.fraction).toBeGreaterThanOrEqual(0);
      expect(report.fraction).toBeLessThanOrEqual(1);
    }
  });

  it("phases come in the order scale, landmarks, members, edges (later phases after them), and each phase's fractions never decrease", () => {
    const reports = progress();
    const phases = reports.map((r) => r.phase).filter((phase, k, all) => phase !== all[k - 1]);
    expect(new Set(phases).size).toBe(phases.length); // each phase reports in one stretch
    expect(phases.slice(0, 4)).toEqual(["scale", "landmarks", "members", "edges"]);
    for (const phase of phases) {
      const fractions = reports.filter((r) => r.phase === phase).map((r) => r.fraction);
      expect(fractions).toEqual([...fractions].sort((a, b) => a - b));
    }
  });

  it("landmarks and members report progress beyond their start", () => {
    const reports = progress();
    expect(reports.some((r) => r.phase === "landmarks" && r.fraction > 0)).toBe(true);
    expect(reports.some((r) => r.phase === "members" && r.fraction > 0)).toBe(true);
  });
});
