import { describe, expect, it } from "vitest";
import { Cancelled, checkStop, lapClock } from "../../src/core/control.ts";

describe("control", () => {
  it("a lap timer over a clock reading 10, 13, 20 returns laps 3 and 7 (worked by hand)", () => {
    const readings = [10, 13, 20];
    const lap = lapClock(() => readings.shift()!);
    expect([lap(), lap()]).toEqual([3, 7]);
  });

  it("checkStop throws Cancelled when shouldStop says so, and nothing otherwise", () => {
    expect(() => checkStop({ shouldStop: () => true }, "the test")).toThrow(Cancelled);
    expect(() => checkStop({ shouldStop: () => false }, "the test")).not.toThrow();
  });
});
