import { readFileSync } from "node:fs";
import { buildUsage, parseBuildArgs } from "./parseBuildArgs.ts";
import { runBuild } from "./runBuild.ts";
import { parseSweepArgs, sweepUsage } from "./parseSweepArgs.ts";
import { runSweep } from "./runSweep.ts";
import { explainUsage, parseExplainArgs } from "./parseExplainArgs.ts";
import { runExplain } from "./runExplain.ts";
import { hotspotsUsage, parseHotspotArgs } from "./parseHotspotArgs.ts";
import { runHotspots } from "./runHotspots.ts";
import { drawUsage, parseDrawArgs } from "./parseDrawArgs.ts";
import { runDraw } from "./runDraw.ts";

const usages: Readonly<Record<string, string>> = { build: buildUsage, sweep: sweepUsage, explain: explainUsage, hotspots: hotspotsUsage, draw: drawUsage };
export const topUsage = `shoal build DATA --out DIR [options]     one cover graph: nodes.csv, members.csv, edges.csv, summary.json
shoal sweep DATA [--out FILE] [options]   the graph's figures at many radii, one CSV line per radius
shoal explain DATA --nodes 3,4 [options]  what sets the rows of some nodes apart, one CSV line per column
shoal hotspots DATA --scan COL --out DIR  where an outcome runs high or low, with p-values for the search
shoal draw DATA --colour-by COL --out F.svg  a picture of the graph with legend and caption (.svg or .png)
shoal help [build | sweep | explain | hotspots | draw]  the options of a command (also: shoal build --help)
shoal --version                           the version`;

/** Set to package.json's version by the bundler (scripts/buildCli.mjs); absent when the sources run as they are. */
declare const SHOAL_VERSION: string | undefined;

/** The version in package.json: inlined in the bundle, which lives in another folder; read from the file otherwise. */
export function version(): string {
  if (typeof SHOAL_VERSION === "string") return SHOAL_VERSION;
  return (JSON.parse(readFileSync(new URL("../../package.json", import.meta.url), "utf8")) as { version: string }).version;
}

/** Entry of the headless command; returns the exit code. Errors are one line on stderr. */
export async function main(args: readonly string[]): Promise<number> {
  const [command, ...rest] = args;
  try {
    if (command !== undefined && command in usages && (rest.includes("--help") || rest.includes("-h"))) {
      console.log(usages[command]);
      return 0;
    }
    switch (command) {
      case "build":
        console.log(await runBuild(parseBuildArgs(rest)));
        return 0;
      case "sweep":
        process.stdout.write(await runSweep(parseSweepArgs(rest)));
        return 0;
      case "explain":
        process.stdout.write(await runExplain(parseExplainArgs(rest)));
        return 0;
      case "hotspots":
        console.log(await runHotspots(parseHotspotArgs(rest)));
        return 0;
      case "draw":
        console.log(await runDraw(parseDrawArgs(rest)));
        return 0;
      case "--version":
      case "-v":
      case "version":
        if (rest[0] !== undefined) throw new Error(`unexpected argument: ${rest[0]}`);
        console.log(`shoal ${version()}`);
        return 0;
      case undefined:
        console.error(topUsage);
        return 2;
      case "help":
      case "--help":
      case "-h": {
        const topic = command === "help" ? rest[0] : undefined;
        if (topic !== undefined && !(topic in usages)) throw new Error(`unknown command: ${topic}`);
        console.log(topic === undefined ? `${topUsage}\n\n${buildUsage}\n\n${sweepUsage}\n\n${explainUsage}\n\n${hotspotsUsage}\n\n${drawUsage}` : usages[topic]);
        return 0;
      }
      default:
        throw new Error(`unknown command: ${command}`);
    }
  } catch (error) {
    console.error(`shoal: ${error instanceof Error ? error.message : String(error)}`);
    return 2;
  }
}
