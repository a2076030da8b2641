import { nodeMembers, readingRecord, recipeToJson, type ByteReadOptions, type ParsedTable } from "../core/index.ts";
import { createWorkerClient, type WorkerClient } from "../worker/client.ts";
import type { TableSource } from "../worker/protocol.ts";
import { defaultRoles, type RoleHints } from "./defaultRoles.ts";
import { demoTable } from "./demo.ts";
import { createHotspotActions, type HotspotActions } from "./hotspotActions.ts";
import { createRegionActions } from "./regionActions.ts";
import { firstFreeRegionName, renameRefusal } from "./regionNames.ts";
import { createRegionPaneActions, type RegionPaneActions } from "./regionPaneActions.ts";
import { createRecipeActions, type RecipeActions } from "./recipeActions.ts";
import { recipeFromState } from "./recipeFromState.ts";
import { createKeepingActions, type KeepingActions } from "./session/sessionWiring.ts";
import { selectTrackedRows } from "./regionSelectors.ts";
import { selectCoverParams, selectIdColumn, selectOutcomeNames, selectRegionRows, selectStatsColumns } from "./selectors.ts";
import type { DataSource } from "./slices/dataSlice.ts";
import type { ColumnRole, ParamsSlice } from "./slices/paramsSlice.ts";
import type { NamedRegion } from "./slices/selectionSlice.ts";
import { workbenchStore, type WorkbenchStore } from "./store.ts";
import { answerError, fileStem } from "./answerError.ts";

export interface ActionEnvironment {
  readonly client: WorkerClient;
  /** Reads the demo table's text (a same-origin fetch in the browser). */
  readonly fetchDemo: () => Promise<string>;
  readonly now: () => number;
}

export type Actions = ReturnType<typeof createActions>;

/** The export zip as the worker wrote it. */
export interface ExportedFile {
  readonly fileName: string;
  readonly bytes: Uint8Array;
}

/**
 * The only caller of the worker client. Every load and build takes a ticket; an answer whose
 * ticket is older than the latest is dropped, so a quick slider drag never shows a stale graph.
 */
export function createActions(store: WorkbenchStore, env: ActionEnvironment) {
  let latestLoad = 0;
  let latestBuild = 0;
  // bumped by every action that decides the radius (a typed radius, a request for the default
  // rule): a default-radius answer applies only if no such action came after its request
  let radiusIntent = 0;
  let latestStats = 0;
  let latestExport = 0;
  const set = store.setState;

  interface LoadRequest {
    readonly tableSource: TableSource;
    readonly source: DataSource;
    readonly hints: RoleHints;
    readonly colorBy: string | null;
  }
  let lastLoad: LoadRequest | null = null;
  let loadedSource: TableSource | null = null; // what the current table was read from, for reading rows again

  async function load(request: LoadRequest, options: ByteReadOptions): Promise<void> {
    const ticket = ++latestLoad;
    latestBuild++; // any build in flight belongs to the old table
    lastLoad = request;
    set({ loadStatus: "loading", loadError: null, loadNotice: null, loadProgress: 0, readOptions: options });
    const answer = await env.client.send({ type: "load", source: request.tableSource, options }, (progress) => {
      if (ticket === latestLoad) set({ loadProgress: progress.fraction });
    });
    if (ticket !== latestLoad) return;
    if (answer.type === "cancelled") {
      set({ loadStatus: store.getState().table ? "ready" : "idle", loadError: null, loadNotice: cancelledNotice(request.source.fileName) });
      return;
    }
    if (answer.type !== "loaded") {
      set({ loadStatus: "failed", loadError: answer.type === "failed" ? answer.message : "unexpected answer" });
      return;
    }
    const { source, hints, colorBy } = request;
    loadedSource = request.tableSource;
    const table: ParsedTable = answer.table;
    const roles = defaultRoles(table, hints);
    const colour = colorBy ?? table.columns.find((c) => roles[c.name] === "outcome" && c.kind === "numeric")?.name ?? null;
    set({
      source, table, report: answer.report, inputFingerprint: answer.fingerprint, roles, weights: {}, colorBy: colour, loadStatus: "ready", result: null, selectedNode: null, selection: [],
      regions: [], activeRegionId: null, rowQuery: null, // regions name rows of the table they were kept on
      radius: NaN, suggestedRadius: NaN, sweep: null, region: null, seedRuns: null,
      stage: answer.report.notices.length > 0 && !source.isDemo ? "report" : "graph",
    });
    await suggestRadius();
  }

  async function suggestRadius(): Promise<void> {
    const loadTicket = latestLoad;
    const intent = ++radiusIntent;
    const s = store.getState();
    const params = selectCoverParams({ ...s, radius: 1 });
    if (!params) return;
    const { radius: _radius, landmarks: _landmarks, seed: _seed, ...basis } = params;
    const answer = await env.client.send({ type: "suggestRadius", params: basis });
    if (loadTicket !== latestLoad) return; // a newer table has been loaded since
    if (intent !== radiusIntent) return; // the user set a radius (or asked again) after this request
    if (answer.type === "cancelled") return;
    if (answer.type === "radius" && answer.radius > 0) {
      set({ radius: answer.radius, suggestedRadius: answer.radius });
      await rebuild();
      return;
    }
    // no default radius: say why and build nothing (a graph of the previous recipe would mislead)
    latestBuild++;
    const error = answer.type === "failed" ? answer.message : answer.type === "radius" ? `no default radius for this recipe: ${answer.radius}` : "unexpected answer";
    set({ suggestedRadius: NaN, result: null, selectedNode: null, selection: [], build: { state: "failed", phase: null, fraction: 0, error, elapsedMs: null } });
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
    mark("shoal:build-requested");
    // a newer compute request cancels the running one: a sweep or seed run here ends without an answer
    if (store.getState().stability.state === "running") set({ stability: idleStability });
    set({ build: { state: "running", phase: null, fraction: 0, error: null, elapsedMs: null } });
    const answer = await env.client.send({ type: "build", params }, (progress) => {
      if (ticket !== latestBuild || progress.phase === "parse" || progress.phase === "suggest" || progress.phase === "sweep" || progress.phase === "seeds" || progress.phase === "region" || progress.phase === "hotspots") return;
      set({ build: { ...store.getState().build, phase: progress.phase, fraction: progress.fraction } });
    });
    mark(answer.type === "cancelled" ? "shoal:build-cancelled" : "shoal:build-answered");
    if (ticket !== latestBuild || answer.type === "cancelled") return;
    if (answer.type === "built") {
      set({ result: answer.result, selectedNode: null, selection: [], build: { state: "done", phase: null, fraction: 1, error: null, elapsedMs: env.now() - started } });
    } else {
      set({ build: { state: "failed", phase: null, fraction: 0, error: answer.type === "failed" ? answer.message : "unexpected answer", elapsedMs: null } });
    }
  }

  /** Asks the worker for the open node's member statistics, unless they are here or on their way. */
  async function requestNodeStats(): Promise<void> {
    const s = store.getState();
    const { result, selectedNode: node, nodeStats } = s;
    if (!result || node === null || node >= result.landmarks.length) return;
    if (nodeStats.result === result && nodeStats.node === node && (nodeStats.state === "running" || nodeStats.state === "done")) return;
    const ticket = ++latestStats;
    set({ nodeStats: { result, node, state: "running", columns: [], error: null } });
    // a copy of the node's rows: posting a view would copy the whole member list's buffer
    const answer = await env.client.send({ type: "nodeStats", rows: nodeMembers(result.members, node).slice(), columns: selectStatsColumns(s) });
    if (ticket !== latestStats) return;
    if (answer.type === "summarised") set({ nodeStats: { result, node, state: "done", columns: answer.columns, error: null } });
    else set({ nodeStats: { result, node, state: "failed", columns: [], error: answerError(answer) } });
  }

  /** A sweep or seed run cancels a running build (a newer compute request wins): it will get no answer. */
  const endRunningBuild = (): void => {
    const { build } = store.getState();
    if (build.state === "running") set({ build: { state: "idle", phase: null, fraction: 0, error: null, elapsedMs: null } });
  };

  const setAndRebuild = (patch: Partial<ParamsSlice>): Promise<void> => {
    set(patch);
    return rebuild();
  };

  const loadText = (text: string, source: DataSource, hints: RoleHints = {}, colorBy: string | null = null): Promise<void> =>
    load({ tableSource: { kind: "text", text }, source, hints, colorBy }, {});

  return {
    ...createRegionActions(store),
    loadText,
    suggestRadius,
    /** Reads the last table again with other reading options (delimiter, decimal mark, encoding, ragged rows). */
    reload(options: ByteReadOptions): Promise<void> {
      return lastLoad ? load(lastLoad, options) : Promise.resolve();
    },
    cancelLoad(): void {
      if (store.getState().loadStatus !== "loading") return;
      latestLoad++;
      env.client.cancel("load");
      set({ loadStatus: store.getState().table ? "ready" : "idle", loadError: null, loadNotice: cancelledNotice(lastLoad?.source.fileName ?? "the table") });
    },
    rebuild,
    /** The text or file the current table was read from (null before the first load). */
    loadedSource: (): TableSource | null => loadedSource,
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
    loadFile(file: Blob & { readonly name: string }): Promise<void> {
      return load({ tableSource: { kind: "file", file }, source: { fileName: file.name, fileSize: file.size, isDemo: false }, hints: {}, colorBy: null }, {});
    },
    setRole(column: string, role: ColumnRole): Promise<void> {
      const roles = { ...store.getState().roles };
      // one identifier at a time: a new id demotes the old one
      if (role === "id") for (const [name, r] of Object.entries(roles)) if (r === "id") roles[name] = "ignore";
      roles[column] = role;
      return setAndRebuild({ roles });
    },
    setRadius(radius: number): Promise<void> {
      if (!(radius > 0 && Number.isFinite(radius))) return Promise.resolve();
      radiusIntent++;
      return setAndRebuild({ radius });
    },
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
    setWeight(column: string, weight: number): Promise<void> {
      if (!(weight >= 0) || !Number.isFinite(weight)) return Promise.resolve();
      return setAndRebuild({ weights: { ...store.getState().weights, [column]: weight } });
    },
    /** Stops the running build (the worker answers "cancelled"); the graph shown before stays. */
    cancelBuild(): void {
      latestBuild++;
      env.client.cancel("compute");
      set({ build: { state: "idle", phase: null, fraction: 0, error: null, elapsedMs: null } });
    },
    setColorBy: (colorBy: string | null): void => set({ colorBy, colorLevel: null }),
    setColorLevel: (colorLevel: string | null): void => set({ colorLevel }),
    /**
     * Opens a node (null closes the pane). The region changes only on purpose: with `toggleRegion`
     * (shift-click, "Add to region") the node also joins the region, or leaves it if it was in.
     */
    selectNode(selectedNode: number | null, toggleRegion = false): Promise<void> {
      const region = store.getState().selection;
      if (selectedNode === null || !toggleRegion) set({ selectedNode });
      else if (region.includes(selectedNode)) set({ selectedNode, selection: region.filter((k) => k !== selectedNode) });
      else set({ selectedNode, selection: [...region, selectedNode].sort((a, b) => a - b) });
      return requestNodeStats();
    },
    clearRegion: (): void => set({ selection: [] }),
    /** Keeps the selection as a new named region ("Region A", "Region B", …): the union of its nodes' rows, each once; it becomes the active region. */
    keepSelectionAsRegion(): NamedRegion | null {
      const s = store.getState();
      const rows = selectRegionRows(s);
      if (!rows || rows.length === 0) return null;
      const id = nextRegionId++;
      const region: NamedRegion = { id, name: firstFreeRegionName(s.regions), rows };
      set({ regions: [...s.regions, region], activeRegionId: id });
      return region;
    },
    /** Renames a region; returns why not (empty, or another region's name) and leaves it unchanged, else null. */
    renameRegion(id: number, name: string): string | null {
      const trimmed = name.trim();
      const { regions } = store.getState();
      const refusal = renameRefusal(regions, id, trimmed);
      if (refusal === null) set({ regions: regions.map((r) => (r.id === id ? { ...r, name: trimmed } : r)) });
      return refusal;
    },
    deleteRegion(id: number): void {
      const s = store.getState();
      set({ regions: s.regions.filter((r) => r.id !== id), activeRegionId: s.activeRegionId === id ? null : s.activeRegionId });
    },
    setActiveRegion: (activeRegionId: number | null): void => set({ activeRegionId }),
    showStage: (stage: "graph" | "report"): void => set({ stage }),
    setSweepRange(sweepMin: number | null, sweepMax: number | null, sweepSteps: number): void {
      set({ sweepMin, sweepMax, sweepSteps });
    },
    setSeedCount: (seedCount: number): void => set({ seedCount }),
    /** Radius sweep over the current recipe (without its radius); tracks the active region, else the selection's rows. */
    async runSweep(): Promise<void> {
      const s = store.getState();
      const params = selectCoverParams({ ...s, radius: s.radius > 0 ? s.radius : 1 });
      if (!params) return;
      const { radius: _radius, ...sweepParams } = params;
      const ticket = ++latestBuild;
      endRunningBuild();
      set({ stability: { state: "running", task: "sweep", fraction: 0, error: null } });
      const range = { steps: s.sweepSteps, ...(s.sweepMin === null ? {} : { radiusMin: s.sweepMin }), ...(s.sweepMax === null ? {} : { radiusMax: s.sweepMax }), ...(s.radius > 0 ? { current: s.radius } : {}) };
      const answer = await env.client.send({ type: "sweep", params: sweepParams, range, selection: selectTrackedRows(s) }, (progress) => {
        if (ticket === latestBuild) set({ stability: { ...store.getState().stability, fraction: progress.fraction } });
      });
      if (ticket !== latestBuild || answer.type === "cancelled") return;
      if (answer.type === "swept") set({ sweep: answer.sweep, region: answer.region, stability: { state: "idle", task: null, fraction: 1, error: null } });
      else set({ stability: { state: "failed", task: "sweep", fraction: 0, error: answer.type === "failed" ? answer.message : "unexpected answer" } });
    },
    /** Rebuilds at the current radius with k seeds (seeded shuffle) and reports their spread and agreement. */
    async runSeedStability(): Promise<void> {
      const s = store.getState();
      const params = selectCoverParams(s);
      if (!params) return;
      const ticket = ++latestBuild;
      endRunningBuild();
      set({ stability: { state: "running", task: "seeds", fraction: 0, error: null } });
      const answer = await env.client.send({ type: "seeds", params, seeds: s.seedCount, selection: selectTrackedRows(s) }, (progress) => {
        if (ticket === latestBuild) set({ stability: { ...store.getState().stability, fraction: progress.fraction } });
      });
      if (ticket !== latestBuild || answer.type === "cancelled") return;
      if (answer.type === "seeded") set({ seedRuns: answer.stability, stability: { state: "idle", task: null, fraction: 1, error: null } });
      else set({ stability: { state: "failed", task: "seeds", fraction: 0, error: answer.type === "failed" ? answer.message : "unexpected answer" } });
    },
    cancelStability(): void {
      latestBuild++;
      env.client.cancel("compute");
      set({ stability: idleStability });
    },
    /**
     * The export zip of the current result, written by the worker and handed to `save` (the page's
     * download); null when nothing is built, when a newer export was asked for meanwhile, or on
     * failure, of the worker or of `save` (then `exportStatus` says why).
     */
    async exportCover(save: (file: ExportedFile) => void = () => {}): Promise<ExportedFile | null> {
      const s = store.getState();
      if (!s.table || !s.result || !s.source) return null;
      const ticket = ++latestExport;
      const reading = s.report ? { reading: readingRecord(s.report.format, s.readOptions.ragged) } : {};
      const regions = s.regions.map((r) => ({ name: r.name, rows: r.rows }));
      const context = { fileName: s.source.fileName, fileSize: s.source.fileSize, idColumn: selectIdColumn(s), outcomes: selectOutcomeNames(s), ...reading, regions };
      const stem = fileStem(s.source.fileName);
      set({ exportStatus: { state: "running", error: null } });
      const recipe = recipeFromState(s); // every exported table says how it was made
      const answer = await env.client.send({ type: "exportZip", result: s.result, context, ...(recipe ? { recipe: recipeToJson(recipe) } : {}) });
      if (ticket !== latestExport) return null;
      if (answer.type !== "zipped") {
        set({ exportStatus: { state: "failed", error: answerError(answer) } });
        return null;
      }
      const file = { fileName: `${stem}-cover-r${s.result.params.radius}.zip`, bytes: answer.bytes };
      try {
        save(file);
      } catch (error) {
        set({ exportStatus: { state: "failed", error: `the zip could not be saved: ${error instanceof Error ? error.message : String(error)}` } });
        return null;
      }
      set({ exportStatus: { state: "idle", error: null } });
      return file;
    },
  };
}


let nextRegionId = 1;

const cancelledNotice = (fileName: string): string => `reading ${fileName} was cancelled; the table shown is unchanged`;

const idleStability = { state: "idle", task: null, fraction: 0, error: null } as const;

/** A User Timing mark (seen by the benchmark's browser probe); a no-op where there is no performance API. */
function mark(name: string): void {
  globalThis.performance?.mark?.(name);
}

let appActions: (Actions & RegionPaneActions & HotspotActions & RecipeActions & KeepingActions) | null = null;

/** Actions bound to the application's store and a worker, created on first use (the region pane's and the hotspot pane's composed in). */
export function actions(): Actions & RegionPaneActions & HotspotActions & RecipeActions & KeepingActions {
  if (appActions) return appActions;
  const env: ActionEnvironment = {
    client: createWorkerClient(),
    fetchDemo: async () => {
      const response = await fetch(new URL(demoTable.url, document.baseURI));
      if (!response.ok) throw new Error(`http ${response.status}`);
      return response.text();
    },
    now: () => performance.now(),
  };
  const base = createActions(workbenchStore, env);
  const hotspots = createHotspotActions(workbenchStore, { ...env, takeRegionId: () => nextRegionId++ });
  const recipes = createRecipeActions(workbenchStore, { takeRegionId: () => nextRegionId++, reload: base.reload, setRadius: base.setRadius });
  const keeping = createKeepingActions(workbenchStore, { ...base, applyRecipe: recipes.applyRecipe, takeRegionId: () => nextRegionId++ }); // undo/redo and the kept session
  appActions = { ...base, ...createRegionPaneActions(workbenchStore, env, base.loadedSource), ...hotspots, ...recipes, ...keeping };
  return appActions;
}
