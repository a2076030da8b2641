import { parseArgs } from "node:util";

/**
 * Options take a value ("string") or none ("boolean", a switch). There are no defaults here: an
 * option not typed stays undefined, so a recipe's value can fill it before the defaults do.
 */
export type OptionSpec = Record<string, { readonly type: "string" } | { readonly type: "boolean" }>;

export interface ParsedArgs {
  /** Values of the options that take one, as typed; undefined when not typed. */
  readonly values: Record<string, string | undefined>;
  /** The switches typed. */
  readonly flags: ReadonlySet<string>;
  readonly positionals: string[];
}

/**
 * node:util parseArgs in strict mode, with fixes for a command line: a value that starts with "-"
 * followed by a digit ("--radius -1") is taken as the option's value, not as an option; an option
 * given twice is an error naming it; and parser errors become one lowercase line
 * ("unknown option: --x", "missing value for --out").
 */
export function strictArgs(args: readonly string[], options: OptionSpec): ParsedArgs {
  const joined: string[] = [];
  for (let k = 0; k < args.length; ++k) {
    const token = args[k]!;
    const next = args[k + 1];
    const isSwitch = options[token.slice(2)]?.type === "boolean";
    if (token.startsWith("--") && !isSwitch && !token.includes("=") && next !== undefined && /^-[\d.]/.test(next)) {
      joined.push(`${token}=${next}`);
      k++;
    } else joined.push(token);
  }
  let parsed: ReturnType<typeof parseArgs<{ args: string[]; allowPositionals: true; strict: true; options: OptionSpec; tokens: true }>>;
  try {
    parsed = parseArgs({ args: joined, allowPositionals: true, strict: true, options, tokens: true });
  } catch (error) {
    const message = error instanceof Error ? error.message.split("\n")[0]! : String(error);
    const unknown = /Unknown option '([^']+)'/.exec(message);
    const missing = /Option '(--[^ ']+)[^']*' argument missing/.exec(message);
    throw new Error(unknown ? `unknown option: ${unknown[1]}` : missing ? `missing value for ${missing[1]}` : message.charAt(0).toLowerCase() + message.slice(1), { cause: error });
  }
  // parseArgs keeps the last of a repeated option; two values for one setting is more likely a slip
  const seen = new Set<string>();
  for (const token of parsed.tokens) {
    if (token.kind !== "option") continue;
    if (seen.has(token.name)) throw new Error(`--${token.name} given twice`);
    seen.add(token.name);
  }
  const values: Record<string, string | undefined> = {};
  const flags = new Set<string>();
  for (const [name, value] of Object.entries(parsed.values)) {
    if (typeof value === "string") values[name] = value;
    else if (value === true) flags.add(name);
  }
  return { values, flags, positionals: parsed.positionals };
}
