import type { WorkbenchStore } from "../store.ts";
import { isSettled } from "./isSettled.ts";

/**
 * Resolves once the store is settled (see isSettled) or nothing more will come (no table, or the
 * load failed), or after `timeoutMs` whatever its state.
 */
export function whenSettled(store: WorkbenchStore, timeoutMs = 120_000): Promise<void> {
  return new Promise((resolve) => {
    // checked a microtask later: an action that set its parameters starts its build in the same task
    const check = (): void => void queueMicrotask(() => {
      const s = store.getState();
      if (!isSettled(s) && s.loadStatus !== "failed" && s.loadStatus !== "idle") return;
      done();
    });
    const stop = store.subscribe(check);
    const timer = setTimeout(() => done(), timeoutMs);
    function done(): void {
      stop();
      clearTimeout(timer);
      resolve();
    }
    check();
  });
}
