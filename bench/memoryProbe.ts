// Peak memory during a synchronous build, sampled where the build lets us in: at every progress
// report and around every call. Probe: process.memoryUsage() heapUsed + arrayBuffers (typed arrays
// live in array buffers, outside the JS heap), minus the same figure just before the build.

export interface MemoryProbe {
  /** Takes one sample. */
  readonly sample: () => void;
  /** Largest sample so far minus the baseline, in bytes. */
  readonly peak: () => number;
}

const used = (): number => {
  const m = process.memoryUsage();
  return m.heapUsed + m.arrayBuffers;
};

export const memoryProbeName = "process.memoryUsage() heapUsed + arrayBuffers, sampled at progress reports";

export function memoryProbe(): MemoryProbe {
  (globalThis as { gc?: () => void }).gc?.();
  const baseline = used();
  let highest = baseline;
  return {
    sample: () => {
      highest = Math.max(highest, used());
    },
    peak: () => highest - baseline,
  };
}
