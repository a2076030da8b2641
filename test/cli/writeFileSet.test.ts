import { mkdtemp, readdir, readFile, rename, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { manifestName, writeFileSet, type FileSteps } from "../../src/cli/writeFileSet.ts";

const scratch = (): Promise<string> => mkdtemp(join(tmpdir(), "shoal-write-"));
const read = (dir: string, name: string): Promise<string> => readFile(join(dir, name), "utf8");
const listed = async (dir: string): Promise<string[]> => (await readdir(dir)).sort();

/** Node's steps, except that the n-th rename (1-based) throws. */
function failingRename(n: number): FileSteps {
  let calls = 0;
  return {
    writeFile: (path, text) => writeFile(path, text),
    rename: async (from, to) => {
      if (++calls === n) throw new Error("injected failure");
      await rename(from, to);
    },
  };
}

describe("writeFileSet: Shoal's files in --out are replaced as a set", () => {
  it("an output path that is a file is refused and left as it was", async () => {
    const folder = await scratch();
    const file = join(folder, "taken");
    await writeFile(file, "x");
    await expect(writeFileSet(file, { "a.csv": "1\n" })).rejects.toThrow(`output path is not a folder: ${file}`);
    expect(await readdir(folder)).toEqual(["taken"]);
  });

  it("writes every file and the manifest into a new folder, and leaves no staging or backup folder", async () => {
    const out = join(await scratch(), "out");
    await writeFileSet(out, { "a.csv": "1\n", "b.json": "{}\n" });
    expect(await listed(out)).toEqual([manifestName, "a.csv", "b.json"]);
    expect(await read(out, manifestName)).toBe("# files written by shoal; the next run replaces or removes exactly these\na.csv\nb.json\n");
  });

  it("a user's own file in the folder survives a run and the next run", async () => {
    const out = await scratch();
    await writeFile(join(out, "notes.txt"), "mine");
    await writeFileSet(out, { "a.csv": "1\n" });
    await writeFileSet(out, { "a.csv": "2\n" });
    expect(await listed(out)).toEqual([manifestName, "a.csv", "notes.txt"]);
    expect(await read(out, "notes.txt")).toBe("mine");
    expect(await read(out, "a.csv")).toBe("2\n");
  });

  it("a stale Shoal file from an earlier run with another set of files is removed (extra.csv)", async () => {
    const out = await scratch();
    await writeFileSet(out, { "a.csv": "1\n", "extra.csv": "old\n" });
    await writeFileSet(out, { "a.csv": "2\n" });
    expect(await listed(out)).toEqual([manifestName, "a.csv"]);
  });

  // The previous set is a.csv, b.csv and the manifest: renames 1–3 move them to the backup, 4–6 move the new ones in.
  it.each([1, 2, 3, 4, 5, 6])("a failure at rename %i leaves the complete previous set, the user's file, and no staging or backup folder", async (n) => {
    const out = await scratch();
    await writeFile(join(out, "notes.txt"), "mine");
    await writeFileSet(out, { "a.csv": "old a\n", "b.csv": "old b\n" });
    const manifest = await read(out, manifestName);
    await expect(writeFileSet(out, { "a.csv": "new a\n", "b.csv": "new b\n" }, failingRename(n))).rejects.toThrow(`cannot write to ${out}: injected failure`);
    expect(await listed(out)).toEqual([manifestName, "a.csv", "b.csv", "notes.txt"]);
    expect([await read(out, "a.csv"), await read(out, "b.csv"), await read(out, manifestName), await read(out, "notes.txt")]).toEqual(["old a\n", "old b\n", manifest, "mine"]);
  });

  it("a failure while writing the staging copy leaves the previous set untouched", async () => {
    const out = await scratch();
    await writeFileSet(out, { "a.csv": "old\n" });
    const steps: FileSteps = { rename, writeFile: async () => Promise.reject(new Error("disk full")) };
    await expect(writeFileSet(out, { "a.csv": "new\n" }, steps)).rejects.toThrow(`cannot write to ${out}: disk full`);
    expect(await listed(out)).toEqual([manifestName, "a.csv"]);
    expect(await read(out, "a.csv")).toBe("old\n");
  });

  it("a file given as pieces (a generator) is written as their concatenation, in order: \"a,b\\n1,2\\n3,4\\n\"", async () => {
    const out = await scratch();
    function* pieces(): Generator<string> {
      yield "a,b\n";
      yield "1,2\n";
      yield "3,4\n";
    }
    await writeFileSet(out, { "t.csv": pieces(), "s.json": "{}\n" });
    expect(await read(out, "t.csv")).toBe("a,b\n1,2\n3,4\n"); // the pieces above, joined
    expect(await read(out, "s.json")).toBe("{}\n");
  });

  it("a generator that throws midway leaves the previous set untouched and no staging folder", async () => {
    const out = await scratch();
    await writeFileSet(out, { "t.csv": "old\n" });
    function* failing(): Generator<string> {
      yield "new\n";
      throw new Error("export failed");
    }
    await expect(writeFileSet(out, { "t.csv": failing() })).rejects.toThrow(`cannot write to ${out}: export failed`);
    expect(await listed(out)).toEqual([manifestName, "t.csv"]);
    expect(await read(out, "t.csv")).toBe("old\n");
  });

  it("a manifest line naming a path outside the folder or a hidden file is ignored, so such a file is never removed", async () => {
    const folder = await scratch();
    const out = join(folder, "out");
    await writeFileSet(out, { "a.csv": "1\n" });
    await writeFile(join(folder, "outside.txt"), "keep");
    await writeFile(join(out, ".hidden"), "keep");
    await writeFile(join(out, manifestName), "a.csv\n../outside.txt\n.hidden\n");
    await writeFileSet(out, { "b.csv": "2\n" });
    expect(await listed(out)).toEqual([".hidden", manifestName, "b.csv"]);
    expect(await listed(folder)).toEqual(["out", "outside.txt"]);
  });
});
