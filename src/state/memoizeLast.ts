/** Remembers the last call: same arguments (by identity) give the same object, so React skips re-renders. */
export function memoizeLast<A extends readonly unknown[], R>(compute: (...args: A) => R): (...args: A) => R {
  let lastArgs: A | null = null;
  let lastResult: R;
  return (...args: A): R => {
    if (lastArgs && lastArgs.length === args.length && lastArgs.every((a, i) => Object.is(a, args[i]))) return lastResult;
    lastResult = compute(...args);
    lastArgs = args;
    return lastResult;
  };
}
