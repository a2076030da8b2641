import type { ByteReadOptions, FileFingerprint, ParsedTable, TableReport } from "../../core/index.ts";

export interface DataSource {
  readonly fileName: string;
  readonly fileSize: number;
  /** True for the built-in invented demo table. */
  readonly isDemo: boolean;
}

export interface DataSlice {
  readonly source: DataSource | null;
  readonly table: ParsedTable | null;
  /** What the reader decided about the file: format, column types, missing and flagged cells, notices. */
  readonly report: TableReport | null;
  /** Reading options in force (empty: everything detected). */
  readonly readOptions: ByteReadOptions;
  readonly loadStatus: "idle" | "loading" | "ready" | "failed";
  /** Share of the file read while loading. */
  readonly loadProgress: number;
  readonly loadError: string | null;
  /** A note about the last load that is not a failure (it was cancelled), or null. */
  readonly loadNotice: string | null;
  /** Size and SHA-256 of the bytes the table was read from (the worker hashes them as it reads); null before a load. */
  readonly inputFingerprint: FileFingerprint | null;
}

export const initialData: DataSlice = { source: null, table: null, report: null, readOptions: {}, loadStatus: "idle", loadProgress: 0, loadError: null, loadNotice: null, inputFingerprint: null };
