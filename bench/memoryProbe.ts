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

let warned = false;

export function memoryProbe(): MemoryProbe {
  const gc = (globalThis as { gc?: () => void }).gc;
  // without a collection first, the baseline holds the last run's garbage and peaks read low
  if (gc) gc();
  else if (!warned) {
    warned = true;
    console.error("memory probe: no gc() (run under node --expose-gc, as npm run bench does); peaks may read low");
  }
  const baseline = used();
  let highest = baseline;
  return {
    sample: () => {
      highest = Math.max(highest, used());
    },
    peak: () => highest - baseline,
  };
}
