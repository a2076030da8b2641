/** Tolerances for assertClose: a number passes when |actual − expected| ≤ max(absolute, relative · |expected|). */
export interface Tolerance {
  readonly absolute?: number;
  readonly relative?: number;
}

// With no tolerance given, numbers must agree to 1e-12 relative (a few ulps of accumulated error, common practice, no source);
// an expected 0 then needs an explicit `absolute`.
const defaultRelative = 1e-12;

/**
 * Recursive closeness check for numbers, arrays, typed arrays and plain objects.
 * NaN equals NaN, infinities must match exactly, and a typed array may be compared with a plain
 * array of numbers. Strings, booleans, null and undefined must be identical. Never rounds.
 * Throws an Error naming the path of the first mismatch.
 */
export function assertClose(actual: unknown, expected: unknown, tolerance: Tolerance = {}): void {
  const absolute = tolerance.absolute ?? 0;
  const relative = tolerance.relative ?? (tolerance.absolute === undefined ? defaultRelative : 0);
  if (!(absolute >= 0) || !(relative >= 0)) throw new Error(`invalid tolerance: ${JSON.stringify(tolerance)}`);
  compare(actual, expected, absolute, relative, "value");
}

function compare(actual: unknown, expected: unknown, absolute: number, relative: number, path: string): void {
  if (typeof expected === "number") {
    if (typeof actual !== "number") fail(path, `expected the number ${expected}, got ${describe(actual)}`);
    if (Number.isNaN(expected) || Number.isNaN(actual)) {
      if (Number.isNaN(expected) !== Number.isNaN(actual)) fail(path, `expected ${expected}, got ${actual}`);
      return;
    }
    if (!Number.isFinite(expected) || !Number.isFinite(actual)) {
      if (actual !== expected) fail(path, `expected ${expected}, got ${actual}`);
      return;
    }
    const allowed = Math.max(absolute, relative * Math.abs(expected));
    const error = Math.abs(actual - expected);
    if (!(error <= allowed)) fail(path, `expected ${expected} ± ${allowed}, got ${actual} (off by ${error})`);
    return;
  }
  if (isArrayLike(expected)) {
    if (!isArrayLike(actual)) fail(path, `expected an array, got ${describe(actual)}`);
    if (actual.length !== expected.length) fail(path, `expected length ${expected.length}, got ${actual.length}`);
    for (let i = 0; i < expected.length; ++i) compare(actual[i], expected[i], absolute, relative, `${path}[${i}]`);
    return;
  }
  if (expected !== null && typeof expected === "object") {
    if (actual === null || typeof actual !== "object" || isArrayLike(actual)) fail(path, `expected an object, got ${describe(actual)}`);
    const expectedKeys = Object.keys(expected).sort();
    const actualKeys = Object.keys(actual).sort();
    if (expectedKeys.join("\u0000") !== actualKeys.join("\u0000")) fail(path, `expected keys [${expectedKeys.join(", ")}], got [${actualKeys.join(", ")}]`);
    for (const key of expectedKeys) {
      compare((actual as Record<string, unknown>)[key], (expected as Record<string, unknown>)[key], absolute, relative, `${path}.${key}`);
    }
    return;
  }
  if (!Object.is(actual, expected)) fail(path, `expected ${describe(expected)}, got ${describe(actual)}`);
}

function isArrayLike(value: unknown): value is ArrayLike<unknown> {
  return Array.isArray(value) || (ArrayBuffer.isView(value) && !(value instanceof DataView));
}

function describe(value: unknown): string {
  if (typeof value === "string") return JSON.stringify(value);
  if (isArrayLike(value)) return `${value.constructor.name}(${value.length})`;
  return String(value);
}

function fail(path: string, message: string): never {
  throw new Error(`assertClose: ${path}: ${message}`);
}
