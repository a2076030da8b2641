import type { ParsedTable } from "../../core/index.ts";

export interface DataSource {
  readonly fileName: string;
  readonly fileSize: number;
  /** True for the built-in invented demo table. */
  readonly isDemo: boolean;
}

export interface DataSlice {
  readonly source: DataSource | null;
  readonly table: ParsedTable | null;
  readonly loadStatus: "idle" | "loading" | "ready" | "failed";
  readonly loadError: string | null;
}

export const initialData: DataSlice = { source: null, table: null, loadStatus: "idle", loadError: null };
