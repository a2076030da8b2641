/** The table a kept session was made on: its name, size in bytes and SHA-256 (hex; null when the load gave none). */
export interface KeptFile {
  readonly name: string;
  readonly bytes: number;
  readonly sha256: string | null;
  readonly isDemo: boolean;
}

/**
 * Where restoring the kept session stands. "checking": reading IndexedDB at start-up;
 * "restoring": loading the table and applying the recipe; "needs-file": the table's bytes were not
 * kept, so the page asks for the file; "other-file": the file given has another fingerprint, and the
 * user chooses to apply the session anyway or to start afresh; "failed": why it could not be restored.
 */
export type SessionRestore =
  | { readonly state: "none" }
  | { readonly state: "checking" }
  | { readonly state: "restoring"; readonly file: KeptFile }
  | { readonly state: "needs-file"; readonly file: KeptFile }
  | { readonly state: "other-file"; readonly file: KeptFile; readonly foundSha256: string | null }
  | { readonly state: "failed"; readonly file: KeptFile | null; readonly error: string };

/**
 * Node positions of one laid-out build, 0-based node order, in the layout's own coordinates.
 * `landmarks` names the build (its landmark rows): a rebuild of the same recipe on the same table
 * has the same, and only then are the positions used.
 */
export interface LayoutPositions {
  readonly landmarks: readonly number[];
  readonly x: readonly number[];
  readonly y: readonly number[];
}

export interface SessionSlice {
  readonly sessionRestore: SessionRestore;
  /** "Keep this table in this browser": the table's bytes are kept with the session (off for every new table). */
  readonly keepTable: boolean;
  /** What IndexedDB holds now: a session record, and the kept table's size in bytes (null: no bytes kept). */
  readonly kept: { readonly session: boolean; readonly tableBytes: number | null };
  /** Why the last save or clear failed (a browser may refuse IndexedDB), or null. */
  readonly sessionError: string | null;
  /** The last settled layout, and the one a restored session hands to the graph. */
  readonly layoutPositions: LayoutPositions | null;
  /** Steps undo and redo can take now (the history itself lives in state/history). */
  readonly undoDepth: number;
  readonly redoDepth: number;
}

export const initialSession: SessionSlice = {
  sessionRestore: { state: "none" },
  keepTable: false,
  kept: { session: false, tableBytes: null },
  sessionError: null,
  layoutPositions: null,
  undoDepth: 0,
  redoDepth: 0,
};
