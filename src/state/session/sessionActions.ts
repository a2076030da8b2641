import type { TableSource } from "../../worker/protocol.ts";
import type { RecipeBridge } from "../history/historyActions.ts";
import { whenSettled } from "../history/whenSettled.ts";
import type { SessionRestore } from "../slices/sessionSlice.ts";
import type { WorkbenchState, WorkbenchStore } from "../store.ts";
import { keptSessionOf, maybeKeptSession, type KeptSession } from "./keptSession.ts";
import type { SessionStorage } from "./sessionStore.ts";

export interface SessionEnvironment {
  readonly storage: SessionStorage;
  readonly recipes: RecipeBridge;
  readonly loadDemo: () => Promise<void>;
  readonly loadFile: (file: Blob & { readonly name: string }) => Promise<void>;
  /** What the current table was read from (for its bytes, when the user keeps them). */
  readonly loadedSource: () => TableSource | null;
  /** Wait after a change before the session is written (500 ms in the page). */
  readonly saveDelayMs?: number;
}

/** The kept table's bytes, in a key of their own. */
interface KeptBytes {
  readonly name: string;
  readonly bytes: Uint8Array;
}

// a change of any of these is worth keeping; layout positions and the keep-table box too, below
const watched = [
  "source", "roles", "scale", "metric", "radius", "landmarks", "seed", "missing", "weights", "colorBy", "colorLevel", "regions", "activeRegionId", "selection", "result",
  "readOptions", "hotspotScan",
] as const satisfies readonly (keyof WorkbenchState)[];

const message = (error: unknown): string => (error instanceof Error ? error.message : String(error));

/**
 * The session kept in this browser's IndexedDB: written `saveDelayMs` after a change (and at once
 * when the page is hidden), restored at start-up (with the kept bytes, the demo's own, or a file
 * the user gives again, checked by its SHA-256), and forgotten on request.
 */
export function createSessionActions(store: WorkbenchStore, env: SessionEnvironment) {
  const set = store.setState;
  const delay = env.saveDelayMs ?? 500; // our choice: a slider drag writes once, and little is lost to a crash
  let timer: ReturnType<typeof setTimeout> | null = null;
  let dirty = false;
  // after "forget", nothing is written until the user changes something (a layout coming to rest is not a change)
  let quiet = false;
  let restoring: KeptSession | null = null;
  let restoreLoad = false; // a load the restore asked for, so it does not count as the user's new table
  let started = false;

  const restore = (sessionRestore: SessionRestore): void => set({ sessionRestore });

  // writes run one after another, so an older record never lands after a newer one
  let writing: Promise<void> = Promise.resolve();

  async function write(record: KeptSession): Promise<void> {
    try {
      await env.storage.set("session", record);
      set({ kept: { ...store.getState().kept, session: true }, sessionError: null });
    } catch (error) {
      set({ sessionError: `the session could not be kept in this browser: ${message(error)}` });
    }
  }

  /** Writes the pending change, if any; resolves once every write asked for so far is done. */
  function save(): Promise<void> {
    if (timer !== null) clearTimeout(timer);
    timer = null;
    if (!dirty || quiet) return writing;
    dirty = false;
    const record = keptSessionOf(store.getState(), env.recipes.recipeOf);
    if (record) writing = writing.then(() => write(record));
    return writing;
  }

  store.subscribe((state, previous) => {
    if (state.source !== previous.source && !restoreLoad) onNewTable(state, previous);
    // while a session is being restored (or waits for its file) what is kept stays; after a failed restore, work goes on and is kept
    if (state.sessionRestore.state !== "none" && state.sessionRestore.state !== "failed") return;
    const changed = watched.some((key) => state[key] !== previous[key]);
    if (changed) quiet = false;
    if (quiet || !(changed || state.layoutPositions !== previous.layoutPositions || state.keepTable !== previous.keepTable)) return;
    dirty = true;
    timer ??= setTimeout(() => void save(), delay);
  });

  /** A table the user brought in (not the restore's): a pending restore is given up, and the last table's kept bytes go. */
  function onNewTable(state: WorkbenchState, previous: WorkbenchState): void {
    if (state.sessionRestore.state === "needs-file" || state.sessionRestore.state === "other-file" || state.sessionRestore.state === "failed") {
      restoring = null;
      restore({ state: "none" });
    }
    if (previous.source !== null && (state.keepTable || state.kept.tableBytes !== null)) void setKeepTable(false);
  }

  async function setKeepTable(keep: boolean): Promise<void> {
    const s = store.getState();
    try {
      if (!keep) {
        set({ keepTable: false });
        await env.storage.delete("table-bytes");
        set({ kept: { ...store.getState().kept, tableBytes: null }, sessionError: null });
        return;
      }
      const source = env.loadedSource();
      if (!s.source || s.source.isDemo || !source) return;
      const bytes = source.kind === "file" ? new Uint8Array(await source.file.arrayBuffer()) : new TextEncoder().encode(source.text);
      const kept: KeptBytes = { name: s.source.fileName, bytes };
      await env.storage.set("table-bytes", kept);
      set({ keepTable: true, kept: { ...store.getState().kept, tableBytes: bytes.length }, sessionError: null });
    } catch (error) {
      set({ keepTable: false, sessionError: `the table could not be kept in this browser: ${message(error)}` });
    }
  }

  /** Applies the kept recipe to the table now loaded, then the layout, selection and active region. */
  async function applyKept(record: KeptSession): Promise<void> {
    await whenSettled(store);
    set({ layoutPositions: record.layout });
    const refusal = await env.recipes.apply(record.recipe);
    await whenSettled(store);
    restoring = null;
    if (refusal !== null) {
      restore({ state: "failed", file: record.file, error: refusal });
      return;
    }
    const s = store.getState();
    const nodes = s.result?.landmarks.length ?? 0;
    const activeRegionId = s.regions.find((r) => r.name === record.activeRegion)?.id ?? null;
    set({ selection: record.selection.filter((k) => k < nodes), activeRegionId, keepTable: record.keptTable, sessionRestore: { state: "none" } });
  }

  async function loadForRestore(load: () => Promise<void>): Promise<void> {
    restoreLoad = true;
    try {
      await load();
    } finally {
      restoreLoad = false;
    }
  }

  /** After a load for the restore: apply the session, or ask about another fingerprint. */
  async function checkAndApply(record: KeptSession): Promise<void> {
    const s = store.getState();
    if (!s.table || s.loadStatus !== "ready") {
      restore({ state: "failed", file: record.file, error: s.loadError ?? "the table could not be read" });
      return;
    }
    const found = s.inputFingerprint?.sha256 ?? null;
    if (!record.file.isDemo && found !== record.file.sha256) {
      restore({ state: "other-file", file: record.file, foundSha256: found });
      return;
    }
    await applyKept(record);
  }

  /** Gives the kept session up: the table loaded stays with its defaults (the demo if none); the next change replaces what is kept. */
  async function startAfresh(): Promise<void> {
    restoring = null;
    restore({ state: "none" });
    if (!store.getState().table) await env.loadDemo();
  }

  return {
    /**
     * At start-up: restores the kept session if there is one (asking for its file when its bytes
     * were not kept), else opens the demo.
     */
    async startSession(): Promise<void> {
      // once per page (a development build runs a mount effect twice)
      if (started) return;
      started = true;
      restore({ state: "checking" });
      let record: KeptSession | null;
      let keptBytes: KeptBytes | undefined;
      try {
        const value = await env.storage.get<unknown>("session");
        record = value === undefined ? null : maybeKeptSession(value);
        keptBytes = await env.storage.get<KeptBytes>("table-bytes");
        set({ kept: { session: value !== undefined, tableBytes: keptBytes?.bytes.length ?? null } });
      } catch (error) {
        restore({ state: "failed", file: null, error: `the kept session could not be read: ${message(error)}` });
        await loadForRestore(env.loadDemo); // the message stays up over the demo
        return;
      }
      if (!record) {
        restore({ state: "none" });
        await env.loadDemo();
        return;
      }
      restoring = record;
      const file = record.file;
      if (file.isDemo || (record.keptTable && keptBytes)) {
        restore({ state: "restoring", file });
        await loadForRestore(() => (file.isDemo ? env.loadDemo() : env.loadFile(new File([keptBytes!.bytes as BlobPart], keptBytes!.name))));
        await checkAndApply(record);
      } else {
        restore({ state: "needs-file", file });
      }
    },
    /** The file the user gave to restore the session. */
    async restoreFromFile(file: Blob & { readonly name: string }): Promise<void> {
      const record = restoring;
      if (!record) return;
      restore({ state: "restoring", file: record.file });
      await loadForRestore(() => env.loadFile(file));
      await checkAndApply(record);
    },
    /** Applies the session to a file whose fingerprint differs. */
    async applyAnyway(): Promise<void> {
      const record = restoring;
      if (!record) return;
      restore({ state: "restoring", file: record.file });
      await applyKept(record);
    },
    startAfresh,
    /** "Forget this session": deletes every kept key; nothing is kept again until the next change. */
    async forgetSession(): Promise<void> {
      if (timer !== null) clearTimeout(timer);
      timer = null;
      dirty = false;
      quiet = true;
      await writing; // a write under way would bring the session back after the clear
      try {
        await env.storage.clear();
        set({ keepTable: false, kept: { session: false, tableBytes: null }, sessionError: null });
      } catch (error) {
        set({ sessionError: `the kept session could not be cleared: ${message(error)}` });
      }
      // a restore that was waiting for its file has nothing left to restore
      if (restoring) await startAfresh();
    },
    setKeepTable,
    /** Writes a pending change now (the page is being hidden or closed). */
    flushSession: save,
  };
}

export type SessionActions = ReturnType<typeof createSessionActions>;
