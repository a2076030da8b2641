import { buildUsage, parseBuildArgs } from "./parseBuildArgs.ts";
import { runBuild } from "./runBuild.ts";
import { parseSweepArgs, sweepUsage } from "./parseSweepArgs.ts";
import { runSweep } from "./runSweep.ts";

/** Entry of the headless command; returns the exit code. Errors are one line on stderr. */
export async function main(args: readonly string[]): Promise<number> {
  const [command, ...rest] = args;
  try {
    switch (command) {
      case "build":
        console.log(await runBuild(parseBuildArgs(rest)));
        return 0;
      case "sweep":
        process.stdout.write(await runSweep(parseSweepArgs(rest)));
        return 0;
      case undefined:
      case "help":
      case "--help":
        console.log(`${buildUsage}\n\n${sweepUsage}`);
        return command === undefined ? 2 : 0;
      default:
        throw new Error(`unknown command: ${command}`);
    }
  } catch (error) {
    console.error(`shoal: ${error instanceof Error ? error.message : String(error)}`);
    return 2;
  }
}
