import { createStore, type StoreApi } from "zustand/vanilla";
import { initialData, type DataSlice } from "./slices/dataSlice.ts";
import { initialHotspot, type HotspotSlice } from "./slices/hotspotSlice.ts";
import { initialParams, type ParamsSlice } from "./slices/paramsSlice.ts";
import { initialRegionPane, type RegionPaneSlice } from "./slices/regionPaneSlice.ts";
import { initialResult, type ResultSlice } from "./slices/resultSlice.ts";
import { initialSelection, type SelectionSlice } from "./slices/selectionSlice.ts";
import { initialSession, type SessionSlice } from "./slices/sessionSlice.ts";
import { initialStability, type StabilitySlice } from "./slices/stabilitySlice.ts";

/** Inputs (table, parameters, selection) and the latest result; nothing derivable from them. */
export type WorkbenchState = DataSlice & ParamsSlice & ResultSlice & SelectionSlice & StabilitySlice & RegionPaneSlice & HotspotSlice & SessionSlice;
export type WorkbenchStore = StoreApi<WorkbenchState>;

export const initialState: WorkbenchState = { ...initialData, ...initialParams, ...initialResult, ...initialSelection, ...initialStability, ...initialRegionPane, ...initialHotspot, ...initialSession };

export function createWorkbenchStore(): WorkbenchStore {
  return createStore<WorkbenchState>()(() => initialState);
}

/** The application's one store. Tests make their own with createWorkbenchStore(). */
export const workbenchStore = createWorkbenchStore();
