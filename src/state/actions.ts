import { coverExports, zipExports, type ParsedTable } from "../core/index.ts";
import { createWorkerClient, type WorkerClient } from "../worker/client.ts";
import { defaultRoles, type RoleHints } from "./defaultRoles.ts";
import { demoTable } from "./demo.ts";
import { selectCoverParams, selectIdColumn, selectOutcomeNames } from "./selectors.ts";
import type { DataSource } from "./slices/dataSlice.ts";
import type { ColumnRole, ParamsSlice } from "./slices/paramsSlice.ts";
import { workbenchStore, type WorkbenchStore } from "./store.ts";

export interface ActionEnvironment {
  readonly client: WorkerClient;
  /** Reads the demo table's text (a same-origin fetch in the browser). */
  readonly fetchDemo: () => Promise<string>;
  readonly now: () => number;
}

export type Actions = ReturnType<typeof createActions>;

/**
 * The only caller of the worker client. Every load and build takes a ticket; an answer whose
 * ticket is older than the latest is dropped, so a quick slider drag never shows a stale graph.
 */
export function createActions(store: WorkbenchStore, env: ActionEnvironment) {
  let latestLoad = 0;
  let latestBuild = 0;
  const set = store.setState;

  async function loadText(text: string, source: DataSource, hints: RoleHints = {}, colorBy: string | null = null): Promise<void> {
    const ticket = ++latestLoad;
    latestBuild++; // any build in flight belongs to the old table
    set({ loadStatus: "loading", loadError: null });
    const answer = await env.client.send({ type: "load", text });
    if (ticket !== latestLoad) return;
    if (answer.type !== "loaded") {
      set({ loadStatus: "failed", loadError: answer.type === "failed" ? answer.message : "unexpected answer" });
      return;
    }
    const table: ParsedTable = answer.table;
    const roles = defaultRoles(table, hints);
    const colour = colorBy ?? table.columns.find((c) => roles[c.name] === "outcome" && c.kind === "numeric")?.name ?? null;
    set({ source, table, roles, colorBy: colour, loadStatus: "ready", result: null, selectedNode: null, radius: NaN, suggestedRadius: NaN });
    await suggestRadius();
  }

  async function suggestRadius(): Promise<void> {
    const loadTicket = latestLoad;
    const s = store.getState();
    const features = s.table ? s.table.columns.filter((c) => s.roles[c.name] === "feature").map((c) => c.name) : [];
    if (features.length === 0) return;
    const answer = await env.client.send({ type: "suggestRadius", params: { features, metric: s.metric, scale: s.scale, missing: s.missing, weights: s.weights } });
    if (loadTicket !== latestLoad) return; // a newer table has been loaded since
    if (answer.type === "radius" && answer.radius > 0) {
      set({ radius: answer.radius, suggestedRadius: answer.radius });
      await rebuild();
    } else if (answer.type === "failed") {
      set({ build: { ...store.getState().build, state: "failed", error: answer.message } });
    }
  }

  async function rebuild(): Promise<void> {
    const params = selectCoverParams(store.getState());
    const ticket = ++latestBuild;
    if (!params) {
      // nothing to build (no feature left, or no radius yet): show no graph rather than a stale one
      set({ result: null, selectedNode: null, build: { state: "idle", phase: null, fraction: 0, error: null, elapsedMs: null } });
      return;
    }
    const started = env.now();
    set({ build: { state: "running", phase: null, fraction: 0, error: null, elapsedMs: null } });
    const answer = await env.client.send({ type: "build", params }, (progress) => {
      if (ticket !== latestBuild || progress.phase === "parse") return;
      set({ build: { ...store.getState().build, phase: progress.phase, fraction: progress.fraction } });
    });
    if (ticket !== latestBuild) return;
    if (answer.type === "built") {
      set({ result: answer.result, selectedNode: null, build: { state: "done", phase: null, fraction: 1, error: null, elapsedMs: env.now() - started } });
    } else {
      set({ build: { state: "failed", phase: null, fraction: 0, error: answer.type === "failed" ? answer.message : "unexpected answer", elapsedMs: null } });
    }
  }

  const setAndRebuild = (patch: Partial<ParamsSlice>): Promise<void> => {
    set(patch);
    return rebuild();
  };

  return {
    loadText,
    suggestRadius,
    rebuild,
    async loadDemo(): Promise<void> {
      set({ loadStatus: "loading", loadError: null });
      let text: string;
      try {
        text = await env.fetchDemo();
      } catch (error) {
        set({ loadStatus: "failed", loadError: `the demo table could not be read: ${String(error)}` });
        return;
      }
      await loadText(text, { fileName: demoTable.fileName, fileSize: new TextEncoder().encode(text).length, isDemo: true }, demoTable.roles, demoTable.colorBy);
    },
    async loadFile(file: { name: string; size: number; text(): Promise<string> }): Promise<void> {
      await loadText(await file.text(), { fileName: file.name, fileSize: file.size, isDemo: false });
    },
    setRole(column: string, role: ColumnRole): Promise<void> {
      const roles = { ...store.getState().roles };
      // one identifier at a time: a new id demotes the old one
      if (role === "id") for (const [name, r] of Object.entries(roles)) if (r === "id") roles[name] = "ignore";
      roles[column] = role;
      return setAndRebuild({ roles });
    },
    setRadius: (radius: number): Promise<void> => (radius > 0 && Number.isFinite(radius) ? setAndRebuild({ radius }) : Promise.resolve()),
    setMetric: (metric: ParamsSlice["metric"]): Promise<void> => {
      set({ metric });
      return suggestRadius();
    },
    // a new metric or scaling changes what a radius means, so the default rule picks a new one
    setScale: (scale: ParamsSlice["scale"]): Promise<void> => {
      set({ scale });
      return suggestRadius();
    },
    setMissing: (missing: ParamsSlice["missing"]): Promise<void> => setAndRebuild({ missing }),
    setLandmarks: (landmarks: ParamsSlice["landmarks"]): Promise<void> => setAndRebuild({ landmarks }),
    setSeed: (seed: number): Promise<void> => (Number.isInteger(seed) ? setAndRebuild({ seed }) : Promise.resolve()),
    setColorBy: (colorBy: string | null): void => set({ colorBy }),
    selectNode: (selectedNode: number | null): void => set({ selectedNode }),
    /** The export zip of the current result, or null when nothing is built. */
    exportCover(): { fileName: string; bytes: Uint8Array } | null {
      const s = store.getState();
      if (!s.table || !s.result || !s.source) return null;
      const files = coverExports(s.table, s.result, {
        fileName: s.source.fileName,
        fileSize: s.source.fileSize,
        idColumn: selectIdColumn(s),
        outcomes: selectOutcomeNames(s),
      });
      const stem = s.source.fileName.replace(/\.[^.]*$/, "") || "table";
      return { fileName: `${stem}-cover-r${s.result.params.radius}.zip`, bytes: zipExports(files) };
    },
  };
}

let appActions: Actions | null = null;

/** Actions bound to the application's store and a worker, created on first use. */
export function actions(): Actions {
  appActions ??= createActions(workbenchStore, {
    client: createWorkerClient(),
    fetchDemo: async () => {
      const response = await fetch(new URL(demoTable.url, document.baseURI));
      if (!response.ok) throw new Error(`http ${response.status}`);
      return response.text();
    },
    now: () => performance.now(),
  });
  return appActions;
}
