import { execFile } from "node:child_process";
import { readFileSync, statSync } from "node:fs";
import { basename } from "node:path";
import { fileURLToPath } from "node:url";
import { buildCover, coverExports, parseCsvText, type CoverExports, type CoverParams, type CoverResult, type ParsedTable } from "../../src/core/index.ts";

export const repoRoot = fileURLToPath(new URL("../../", import.meta.url));
export const demoPath = fileURLToPath(new URL("../../public/demo/pump-fleet.csv", import.meta.url));
const binPath = fileURLToPath(new URL("../../bin/shoal.mjs", import.meta.url));

export interface Run {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

/** Runs `node bin/shoal.mjs …args` as a real process, as a user does (the bundle, rebuilt by freshBundle.ts before the tests), and collects its exit code and output. */
export function runShoal(args: readonly string[]): Promise<Run> {
  return new Promise((resolve, reject) => {
    execFile(process.execPath, [binPath, ...args], { cwd: repoRoot, timeout: 30_000 }, (error, stdout, stderr) => {
      if (error && typeof error.code !== "number") reject(error); // not an exit code: the process could not run
      else resolve({ code: error ? Number(error.code) : 0, stdout, stderr });
    });
  });
}

export interface UiExport {
  readonly parsed: ParsedTable;
  readonly result: CoverResult;
  readonly files: CoverExports;
}

/**
 * What the workbench exports for a file (src/state/actions.ts, exportCover): the text through
 * parseCsvText, buildCover with the store's parameters, then coverExports with the file's base
 * name and byte size, the id and outcome roles, and how the file was read (comma-separated, decimal
 * point, ragged rows rejected: the demo's format and the reader's default).
 */
export function uiExport(path: string, params: CoverParams, roles: { idColumn: string | null; outcomes: readonly string[] }): UiExport {
  const parsed = parseCsvText(readFileSync(path, "utf8"));
  const result = buildCover(parsed, params);
  const files = coverExports(parsed, result, { fileName: basename(path), fileSize: statSync(path).size, idColumn: roles.idColumn, outcomes: roles.outcomes, reading: { format: "delimited", delimiter: "comma", decimal: ".", ragged: "reject" } });
  return { parsed, result, files };
}
