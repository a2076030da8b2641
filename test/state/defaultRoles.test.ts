import { describe, expect, it } from "vitest";
import { parseCsvText } from "../../src/core/index.ts";
import { defaultRoles } from "../../src/state/defaultRoles.ts";

const table = parseCsvText("group,name,x,score,note\nA,ann,1,0.5,hi\nA,bob,2,0.7,hi\nB,cyd,3,0.1,yo\n");

describe("defaultRoles", () => {
  it("makes the first text column with distinct, present values the id, numeric columns features, other text ignored", () => {
    // group repeats A; name is unique and complete; note repeats hi.
    expect(defaultRoles(table)).toEqual({ group: "ignore", name: "id", x: "feature", score: "feature", note: "ignore" });
  });

  it("never guesses outcomes: a column named like one stays a feature without a hint", () => {
    expect(defaultRoles(table).score).toBe("feature");
  });

  it("takes outcomes and the id from hints", () => {
    expect(defaultRoles(table, { id: "group", outcomes: ["score"] })).toEqual({ group: "id", name: "ignore", x: "feature", score: "outcome", note: "ignore" });
  });

  it("gives no id when no text column is unique and complete", () => {
    const noId = parseCsvText("name,x\nann,1\n,2\n");
    expect(defaultRoles(noId)).toEqual({ name: "ignore", x: "feature" });
  });
});
