/** The number of steps kept by default: twice the 50 the workbench promises. */
export const defaultHistoryCap = 100; // our choice; at least 50 steps are required

/**
 * A linear undo history of snapshots with a cursor: `record` adds a snapshot after the cursor
 * (dropping the redo tail), `undo` and `redo` move the cursor and return the snapshot to show.
 * A snapshot equal (by `key`) to the one at the cursor is not stored again. Past `cap` entries the
 * oldest is let go, so at most `cap - 1` undo steps remain. Pure: it knows nothing of the store.
 */
export interface UndoHistory<T> {
  /** Stores `snapshot` as the newest step unless it equals the one at the cursor; true when stored. */
  record(snapshot: T): boolean;
  /** The snapshot one step back, now current, or null at the start. */
  undo(): T | null;
  /** The snapshot one step forward, now current, or null at the end. */
  redo(): T | null;
  /** The snapshot at the cursor, or null when nothing is recorded. */
  current(): T | null;
  /** Steps that `undo` can take, and that `redo` can. */
  depth(): { readonly undo: number; readonly redo: number };
  /** Forgets every step (a new table starts a new history). */
  reset(): void;
}

export function createUndoHistory<T>(key: (snapshot: T) => string, cap = defaultHistoryCap): UndoHistory<T> {
  if (!(Number.isInteger(cap) && cap >= 2)) throw new Error(`invalid history cap: ${cap}`);
  let entries: { readonly snapshot: T; readonly key: string }[] = [];
  let cursor = -1;
  return {
    record(snapshot) {
      const k = key(snapshot);
      if (cursor >= 0 && entries[cursor]!.key === k) return false;
      entries = entries.slice(0, cursor + 1);
      entries.push({ snapshot, key: k });
      if (entries.length > cap) entries.shift();
      cursor = entries.length - 1;
      return true;
    },
    undo() {
      if (cursor <= 0) return null;
      return entries[--cursor]!.snapshot;
    },
    redo() {
      if (cursor >= entries.length - 1) return null;
      return entries[++cursor]!.snapshot;
    },
    current: () => (cursor >= 0 ? entries[cursor]!.snapshot : null),
    depth: () => ({ undo: Math.max(0, cursor), redo: entries.length - 1 - cursor }),
    reset() {
      entries = [];
      cursor = -1;
    },
  };
}
