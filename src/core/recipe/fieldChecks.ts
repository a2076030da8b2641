// Small checks for validateRecipe: each returns the value when it fits, or records one message under the field's path.

export type Problems = string[];
export type Json = Record<string, unknown>;

export const isObject = (value: unknown): value is Json => typeof value === "object" && value !== null && !Array.isArray(value);

const shown = (value: unknown): string => JSON.stringify(value) ?? String(value);

/** Records a bad value; an absent one was already reported as a missing field by `objectField`. */
export function bad(problems: Problems, path: string, expected: string, value: unknown): undefined {
  if (value !== undefined) problems.push(`${path}: expected ${expected}, got ${shown(value)}`);
  return undefined;
}

/** The object at `path`, with its unknown keys reported by name. */
export function objectField(problems: Problems, path: string, value: unknown, keys: readonly string[], optional: readonly string[] = []): Json | undefined {
  if (!isObject(value)) return bad(problems, path, "an object", value);
  for (const key of Object.keys(value)) if (!keys.includes(key)) problems.push(`unknown field: ${path === "" ? key : `${path}.${key}`}`);
  for (const key of keys) if (!(key in value) && !optional.includes(key)) problems.push(`missing field: ${path === "" ? key : `${path}.${key}`}`);
  return value;
}

export function oneOf<T extends string>(problems: Problems, path: string, value: unknown, names: readonly T[]): T | undefined {
  return typeof value === "string" && (names as readonly string[]).includes(value) ? (value as T) : bad(problems, path, `one of ${names.join(", ")}`, value);
}

export function oneOfOrNull<T extends string>(problems: Problems, path: string, value: unknown, names: readonly T[]): T | null | undefined {
  return value === null ? null : typeof value === "string" && (names as readonly string[]).includes(value) ? (value as T) : bad(problems, path, `null or one of ${names.join(", ")}`, value);
}

export function text(problems: Problems, path: string, value: unknown): string | undefined {
  return typeof value === "string" && value !== "" ? value : bad(problems, path, "a non-empty text", value);
}

export function textOrNull(problems: Problems, path: string, value: unknown): string | null | undefined {
  return value === null ? null : typeof value === "string" && value !== "" ? value : bad(problems, path, "null or a non-empty text", value);
}

export function integer(problems: Problems, path: string, value: unknown, least: number, most: number): number | undefined {
  return typeof value === "number" && Number.isSafeInteger(value) && value >= least && value <= most ? value : bad(problems, path, `a whole number from ${least} to ${most}`, value);
}

/** Distinct non-empty texts. */
export function names(problems: Problems, path: string, value: unknown): string[] | undefined {
  if (!Array.isArray(value) || !value.every((v) => typeof v === "string" && v !== "")) return bad(problems, path, "a list of column names", value);
  const repeated = value.find((v, k) => value.indexOf(v) !== k);
  if (repeated !== undefined) return bad(problems, path, "each name once", repeated);
  return value as string[];
}
