import { parseArgs } from "node:util";

type StringOptions = Record<string, { type: "string"; default?: string }>;
type AnyOptions = Record<string, { type: "string"; default?: string } | { type: "boolean" }>;

/**
 * node:util parseArgs in strict mode, with fixes for a command line: a value that starts with "-"
 * followed by a digit ("--radius -1") is taken as the option's value, not as an option; an option
 * given twice is an error naming it; and parser errors become one lowercase line
 * ("unknown option: --x", "missing value for --out"). `flags` names options that take no value
 * (`--graphml`); those given are returned in `flags`.
 */
export function strictArgs(
  args: readonly string[],
  options: StringOptions,
  flagNames: readonly string[] = [],
): { values: Record<string, string | undefined>; flags: ReadonlySet<string>; positionals: string[] } {
  const spec: AnyOptions = { ...options };
  for (const name of flagNames) spec[name] = { type: "boolean" };
  const joined: string[] = [];
  for (let k = 0; k < args.length; ++k) {
    const token = args[k]!;
    const next = args[k + 1];
    if (token.startsWith("--") && !token.includes("=") && next !== undefined && /^-[\d.]/.test(next)) {
      joined.push(`${token}=${next}`);
      k++;
    } else joined.push(token);
  }
  let parsed: ReturnType<typeof parseArgs<{ args: string[]; allowPositionals: true; strict: true; options: AnyOptions; tokens: true }>>;
  try {
    parsed = parseArgs({ args: joined, allowPositionals: true, strict: true, options: spec, tokens: true });
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
    if (typeof value === "boolean") flags.add(name);
    else if (typeof value === "string") values[name] = value;
  }
  return { values, flags, positionals: parsed.positionals };
}
