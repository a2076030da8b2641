import { parseArgs } from "node:util";

type StringOptions = Record<string, { type: "string"; default?: string }>;

/**
 * node:util parseArgs in strict mode, with two fixes for a command line: a value that starts
 * with "-" followed by a digit ("--radius -1") is taken as the option's value, not as an option,
 * and parser errors become one lowercase line.
 */
export function strictArgs(args: readonly string[], options: StringOptions): { values: Record<string, string | undefined>; positionals: string[] } {
  const joined: string[] = [];
  for (let k = 0; k < args.length; ++k) {
    const token = args[k]!;
    const next = args[k + 1];
    if (token.startsWith("--") && !token.includes("=") && next !== undefined && /^-[\d.]/.test(next)) {
      joined.push(`${token}=${next}`);
      k++;
    } else joined.push(token);
  }
  try {
    const { values, positionals } = parseArgs({ args: joined, allowPositionals: true, strict: true, options });
    return { values: values as Record<string, string | undefined>, positionals };
  } catch (error) {
    const message = error instanceof Error ? error.message.split("\n")[0]! : String(error);
    const unknown = /Unknown option '([^']+)'/.exec(message);
    throw new Error(unknown ? `unknown option: ${unknown[1]}` : message.charAt(0).toLowerCase() + message.slice(1), { cause: error });
  }
}
