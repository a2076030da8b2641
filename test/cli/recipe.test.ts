// Recipes on the command line, run as real processes (support: runShoal.ts): --save-recipe then
// --recipe reproduces the files; a typed option overrides one field; another file, a damaged or
// newer recipe are one line on standard error and exit code 2.
import { createHash } from "node:crypto";
import { copyFileSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parseRecipe, type Recipe } from "../../src/core/index.ts";
import { parseBuildArgs } from "../../src/cli/parseBuildArgs.ts";
import { demoPath, runShoal, type Run } from "./runShoal.ts";

const scratch = mkdtempSync(join(tmpdir(), "shoal-recipe-test-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

const demoSha = createHash("sha256").update(readFileSync(demoPath)).digest("hex"); // node:crypto, reference library
const demoBytes = readFileSync(demoPath).length;
const firstArgs = ["--id", "pump_id", "--outcome", "failed_within_90d,downtime_h", "--one-hot", "family", "--weights", "age_years=2", "--metric", "manhattan", "--radius", "2.5", "--landmarks", "maximin", "--seed", "4", "--region-nodes", "1,2", "--region-name", "north"];
const compared = ["nodes.csv", "members.csv", "edges.csv"];
const withoutTimings = (dir: string): unknown => {
  const { timingsMs: _timings, ...rest } = JSON.parse(readFileSync(join(dir, "summary.json"), "utf8"));
  return rest;
};
const recipeAt = (path: string): Recipe => parseRecipe(readFileSync(path, "utf8"));

let first: Run;
const firstDir = join(scratch, "first");
const recipePath = join(scratch, "first.recipe.json");
beforeAll(async () => {
  first = await runShoal(["build", demoPath, "--out", firstDir, ...firstArgs, "--save-recipe", recipePath]);
});

describe("shoal build --save-recipe and --recipe", () => {
  it("--save-recipe writes the run's recipe: the demo's fingerprint, resolved features, the radius, the region by record", () => {
    expect(first.code).toBe(0);
    expect(first.stdout).toMatch(/; recipe .*first\.recipe\.json\n$/);
    const recipe = recipeAt(recipePath);
    expect(recipe.input).toEqual({ name: "pump-fleet.csv", bytes: demoBytes, sha256: demoSha });
    expect(recipe.columns).toMatchObject({ id: "pump_id", outcomes: ["failed_within_90d", "downtime_h"], oneHot: ["family"], weights: { age_years: 2 } });
    expect(recipe.columns.features).toHaveLength(10); // the demo's numeric columns less the two outcomes (test/cli/build.test.ts lists them)
    expect(recipe).toMatchObject({ metric: "manhattan", radius: 2.5, landmarks: { rule: "maximin", seed: 4 }, scale: "zscore", missing: "drop" });
    const summary = JSON.parse(readFileSync(join(firstDir, "summary.json"), "utf8"));
    expect(recipe.regions).toEqual([{ name: "north", records: summary.regions[0].records }]);
  });

  it("--recipe alone gives byte-identical nodes.csv, members.csv, edges.csv, region-rows.csv and summary.json apart from timings", async () => {
    const dir = join(scratch, "again");
    const again = await runShoal(["build", demoPath, "--out", dir, "--recipe", recipePath]);
    expect(again.code).toBe(0);
    expect(again.stderr).toBe("");
    for (const name of [...compared, "region-rows.csv"]) expect(readFileSync(join(dir, name), "utf8")).toBe(readFileSync(join(firstDir, name), "utf8"));
    expect(withoutTimings(dir)).toEqual(withoutTimings(firstDir));
  });

  it("a typed option overrides that field only: --metric euclidean changes the metric and nothing else in the recipe", async () => {
    const saved = join(scratch, "override.recipe.json");
    const run = await runShoal(["build", demoPath, "--out", join(scratch, "override"), "--recipe", recipePath, "--metric", "euclidean", "--save-recipe", saved]);
    expect(run.code).toBe(0);
    expect(recipeAt(saved)).toEqual({ ...recipeAt(recipePath), metric: "euclidean" });
  });

  it("an option not typed keeps the recipe's value, not the default (parser: cosine, seed 9 and the radius stay)", () => {
    const path = join(scratch, "cosine.recipe.json");
    writeFileSync(path, JSON.stringify({ ...recipeAt(recipePath), metric: "cosine", landmarks: { rule: "greedy-shuffled", seed: 9 } }));
    const command = parseBuildArgs(["x.csv", "--out", "o", "--recipe", path, "--scale", "robust"]);
    expect(command.params).toMatchObject({ metric: "cosine", landmarks: "greedy-shuffled", seed: 9, scale: "robust", oneHot: ["family"], weights: { age_years: 2 } });
    expect(command.radius).toBe(2.5);
    expect(command.idColumn).toBe("pump_id");
  });

  it("another file: exit code 2 and one line naming both fingerprints; nothing is written", async () => {
    const other = join(scratch, "other.csv");
    writeFileSync(other, readFileSync(demoPath, "utf8").replace("6.1,254.6", "6.2,254.6"));
    const otherSha = createHash("sha256").update(readFileSync(other)).digest("hex");
    const dir = join(scratch, "refused");
    const run = await runShoal(["build", other, "--out", dir, "--recipe", recipePath]);
    expect(run.code).toBe(2);
    expect(run.stderr).toBe(
      `shoal: the recipe was made on pump-fleet.csv (sha256 ${demoSha}, ${demoBytes} bytes), not on this file other.csv (sha256 ${otherSha}, ${demoBytes} bytes); add --allow-other-file to apply it anyway\n`,
    );
    expect(existsSync(dir)).toBe(false);
  });

  it("--allow-other-file applies it with the same line as a warning", async () => {
    const other = join(scratch, "renamed.csv");
    writeFileSync(other, readFileSync(demoPath, "utf8").replace("6.1,254.6", "6.2,254.6"));
    const run = await runShoal(["build", other, "--out", join(scratch, "allowed"), "--recipe", recipePath, "--allow-other-file"]);
    expect(run.code).toBe(0);
    expect(run.stderr).toMatch(/^shoal: warning: the recipe was made on pump-fleet\.csv \(sha256 [0-9a-f]{64}, \d+ bytes\), not on this file renamed\.csv \(sha256 [0-9a-f]{64}, \d+ bytes\)\n$/);
  });

  it("the same bytes under another name are the same file: no warning", async () => {
    const copy = join(scratch, "copy.csv");
    copyFileSync(demoPath, copy);
    const run = await runShoal(["build", copy, "--out", join(scratch, "copy"), "--recipe", recipePath]);
    expect(run).toMatchObject({ code: 0, stderr: "" });
  });

  it("a damaged recipe, a newer schema, a bad field: one line each, exit code 2, nothing written", async () => {
    const damaged = join(scratch, "damaged.json");
    writeFileSync(damaged, readFileSync(recipePath, "utf8").slice(0, 40));
    const newer = join(scratch, "newer.json");
    writeFileSync(newer, JSON.stringify({ ...recipeAt(recipePath), shoalRecipe: 2 }));
    const badRadius = join(scratch, "bad-radius.json");
    writeFileSync(badRadius, JSON.stringify({ ...recipeAt(recipePath), radius: -1, colour: { kind: "none", name: null, level: null, hue: 3 } }));
    const runs = await Promise.all([damaged, newer, badRadius, join(scratch, "absent.json")].map((path, k) => runShoal(["build", demoPath, "--out", join(scratch, `bad${k}`), "--recipe", path])));
    expect(runs.map((r) => r.code)).toEqual([2, 2, 2, 2]);
    expect(runs[0]!.stderr).toMatch(/^shoal: .*damaged\.json: invalid recipe: not readable as JSON \(.*\)\n$/);
    expect(runs[1]!.stderr).toMatch(/^shoal: .*newer\.json: invalid recipe: recipe schema version 2 is newer than this shoal reads \(1\): use a newer shoal\n$/);
    expect(runs[2]!.stderr).toMatch(/^shoal: .*bad-radius\.json: invalid recipe: radius: expected a positive number, got -1; unknown field: colour\.hue\n$/);
    expect(runs[3]!.stderr).toMatch(/^shoal: cannot read recipe file: .*absent\.json\n$/);
    for (let k = 0; k < 4; ++k) expect(existsSync(join(scratch, `bad${k}`))).toBe(false);
  });

  it("a recipe naming a column the other file lacks is one error naming it, even with --allow-other-file", async () => {
    const other = join(scratch, "narrow.csv");
    writeFileSync(other, "pump_id,age_years\nA,1\nB,2\n");
    const run = await runShoal(["build", other, "--out", join(scratch, "narrow"), "--recipe", recipePath, "--allow-other-file"]);
    expect(run.code).toBe(2);
    expect(run.stderr.split("\n").at(-2)).toMatch(/^shoal: unknown column: /);
  });

  it("--allow-other-file without --recipe is refused", () => {
    expect(() => parseBuildArgs(["x.csv", "--out", "o", "--allow-other-file"])).toThrow("--allow-other-file needs --recipe FILE");
  });
});

describe("recipes in the other commands", () => {
  it("sweep --recipe gives the same CSV as the typed options, and --save-recipe keeps the recipe's radius", async () => {
    const saved = join(scratch, "sweep.recipe.json");
    const [typed, fromRecipe] = await Promise.all([
      runShoal(["sweep", demoPath, ...firstArgs.slice(0, 10), "--landmarks", "maximin", "--seed", "4", "--steps", "4"]),
      runShoal(["sweep", demoPath, "--recipe", recipePath, "--steps", "4", "--save-recipe", saved]),
    ]);
    expect(fromRecipe.code).toBe(0);
    expect(fromRecipe.stdout).toBe(typed.stdout);
    expect(recipeAt(saved)).toEqual(recipeAt(recipePath));
  });

  it("hotspots --save-recipe records the scan's settings, and --recipe runs the same scan", async () => {
    const saved = join(scratch, "hotspots.recipe.json");
    const a = join(scratch, "hot-a");
    const b = join(scratch, "hot-b");
    const one = await runShoal(["hotspots", demoPath, "--recipe", recipePath, "--scan", "failed_within_90d", "--replicates", "19", "--out", a, "--save-recipe", saved]);
    expect(one.code).toBe(0);
    expect(recipeAt(saved).hotspots).toEqual({ column: "failed_within_90d", direction: "high", maxNodes: 8, replicates: 19, score: "auto", scanSeed: 1, stabilitySeeds: 0 });
    const two = await runShoal(["hotspots", demoPath, "--recipe", saved, "--out", b]);
    expect(two.code).toBe(0);
    expect(readFileSync(join(b, "hotspots.csv"), "utf8")).toBe(readFileSync(join(a, "hotspots.csv"), "utf8"));
  });

  it("explain --recipe takes the recipe's build", async () => {
    const run = await runShoal(["explain", demoPath, "--recipe", recipePath, "--nodes", "1"]);
    expect(run.code).toBe(0);
    expect(run.stdout.split("\n")[0]).toMatch(/^column,kind,test,/);
  });
});
