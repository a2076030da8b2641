import { useStore } from "zustand";
import { workbenchStore, type WorkbenchState } from "../state/store.ts";

/** React binding of the one store: components select the slice they render. */
export function useWorkbench<T>(selector: (state: WorkbenchState) => T): T {
  return useStore(workbenchStore, selector);
}
