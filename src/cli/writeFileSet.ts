import { mkdir, readFile, rename, rm, stat } from "node:fs/promises";
import { join } from "node:path";
import { writeTextFile, type FileText } from "./writeTextFile.ts";

/** The list of the files Shoal wrote into an output folder, one name a line; only these are ever replaced or removed. */
export const manifestName = ".shoal-files";

/** The file-system steps of a swap, injectable so a test can make one fail midway. */
export interface FileSteps {
  readonly rename: (from: string, to: string) => Promise<void>;
  readonly writeFile: (path: string, text: FileText) => Promise<void>;
}

const nodeSteps: FileSteps = { rename, writeFile: writeTextFile };

/**
 * Replaces the set of Shoal's files in `outDir` as a whole, so that after any failure the folder
 * holds either the complete previous set or the complete new one:
 * 1. write every new file and the new manifest into a fresh staging folder inside `outDir`;
 * 2. move the previous set (the names in the old manifest, the old manifest, and any file in the
 *    way of a new name) into a fresh backup folder inside `outDir`;
 * 3. move the new files in, the manifest last;
 * 4. remove the backup (this drops stale files of an earlier run that the new set lacks) and the staging folder.
 * A failure in steps 2–3 removes what was moved in and moves the backup back, then throws.
 * Files not named in a manifest are never touched. Every move is a rename within one folder's file system.
 */
export async function writeFileSet(outDir: string, files: Readonly<Record<string, FileText>>, steps: FileSteps = nodeSteps): Promise<void> {
  const existing = await stat(outDir).catch(() => null);
  if (existing && !existing.isDirectory()) throw new Error(`output path is not a folder: ${outDir}`);
  const names = Object.keys(files);
  for (const name of names) if (!isPlainName(name)) throw new Error(`invalid output file name: ${name}`);
  const staging = join(outDir, `.shoal-staging-${process.pid}`);
  const backup = join(outDir, `.shoal-backup-${process.pid}`);
  const fail = (error: unknown): Error => new Error(`cannot write to ${outDir}: ${error instanceof Error ? error.message : String(error)}`, { cause: error });
  try {
    await mkdir(outDir, { recursive: true });
    await rm(staging, { recursive: true, force: true });
    await mkdir(staging);
    for (const name of names) await steps.writeFile(join(staging, name), files[name]!);
    await steps.writeFile(join(staging, manifestName), manifestText(names));
  } catch (error) {
    await rm(staging, { recursive: true, force: true });
    throw fail(error);
  }

  const previous = await readManifest(outDir);
  const inTheWay = [...new Set([...previous, ...names, manifestName])];
  const movedOut: string[] = [];
  const movedIn: string[] = [];
  try {
    await rm(backup, { recursive: true, force: true });
    await mkdir(backup);
    for (const name of inTheWay) {
      if (!(await exists(join(outDir, name)))) continue;
      await steps.rename(join(outDir, name), join(backup, name));
      movedOut.push(name);
    }
    for (const name of [...names, manifestName]) {
      await steps.rename(join(staging, name), join(outDir, name));
      movedIn.push(name);
    }
  } catch (error) {
    const restored = await restore(outDir, backup, movedIn, movedOut);
    await rm(staging, { recursive: true, force: true });
    if (restored) await rm(backup, { recursive: true, force: true });
    throw restored ? fail(error) : new Error(`cannot write to ${outDir} nor restore its previous files, which are in ${backup}: ${error instanceof Error ? error.message : String(error)}`, { cause: error });
  }
  // The new set is in place; a folder left here would only hold the old files.
  await rm(backup, { recursive: true, force: true }).catch(() => undefined);
  await rm(staging, { recursive: true, force: true }).catch(() => undefined);
}

async function restore(outDir: string, backup: string, movedIn: readonly string[], movedOut: readonly string[]): Promise<boolean> {
  try {
    for (const name of movedIn) await rm(join(outDir, name), { force: true });
    for (const name of movedOut) await rename(join(backup, name), join(outDir, name));
    return true;
  } catch {
    return false;
  }
}

function manifestText(names: readonly string[]): string {
  return `# files written by shoal; the next run replaces or removes exactly these\n${names.join("\n")}\n`;
}

/** The names in the folder's manifest; lines that are not a plain file name (a path, a hidden name) are ignored. */
async function readManifest(outDir: string): Promise<string[]> {
  const text = await readFile(join(outDir, manifestName), "utf8").catch(() => "");
  return text.split("\n").map((line) => line.trim()).filter((line) => line !== "" && !line.startsWith("#") && isPlainName(line));
}

function isPlainName(name: string): boolean {
  return name !== "" && !name.startsWith(".") && !/[/\\]/.test(name);
}

async function exists(path: string): Promise<boolean> {
  return stat(path).then(() => true, () => false);
}
