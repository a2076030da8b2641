/**
 * Test support: replaces the global Array, ArrayBuffer and typed-array constructors with proxies
 * that note the size in bytes of every array made with a length (8 bytes per element of a plain
 * Array, the pointer size), so a test can bound what a reader allocates. Arrays grown element by
 * element are not seen; the fuzz test's one-second limit catches those.
 */
export function watchAllocations(): { largest(): number; stop(): void } {
  let largest = 0;
  const names = ["Array", "ArrayBuffer", "Uint8Array", "Int8Array", "Uint16Array", "Int16Array", "Uint32Array", "Int32Array", "Float32Array", "Float64Array", "BigInt64Array", "BigUint64Array"] as const;
  const global = globalThis as unknown as Record<string, unknown>;
  const originals = names.map((name) => [name, global[name]] as const);
  for (const [name, original] of originals) {
    const bytesPer = name === "Array" || name === "ArrayBuffer" ? (name === "Array" ? 8 : 1) : (original as { BYTES_PER_ELEMENT: number }).BYTES_PER_ELEMENT;
    global[name] = new Proxy(original as new (...args: unknown[]) => object, {
      construct(target, args, newTarget) {
        if (typeof args[0] === "number" && (name !== "Array" || args.length === 1)) largest = Math.max(largest, args[0] * bytesPer);
        return Reflect.construct(target, args, newTarget === global[name] ? target : newTarget);
      },
    });
  }
  return {
    largest: () => largest,
    stop: () => {
      for (const [name, original] of originals) global[name] = original;
    },
  };
}
