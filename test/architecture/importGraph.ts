import { readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";

/** Every relative import (type-only included) of every .ts/.tsx file under `root`, as paths relative to `root`. */
export function importGraph(root: string): Map<string, string[]> {
  const files: string[] = [];
  const walk = (dir: string): void => {
    for (const name of readdirSync(dir)) {
      const path = join(dir, name);
      if (statSync(path).isDirectory()) walk(path);
      else if (/\.tsx?$/.test(name)) files.push(path);
    }
  };
  walk(root);
  const graph = new Map<string, string[]>();
  // import … from "./x.ts", import type …, export … from, import("./x.ts") and bare side-effect imports
  const pattern = /(?:\bfrom\s*|\bimport\s*\(?\s*)["'](\.{1,2}\/[^"']+)["']/g;
  for (const file of files) {
    const text = readFileSync(file, "utf8");
    const targets = new Set<string>();
    for (const match of text.matchAll(pattern)) targets.add(relative(root, resolve(dirname(file), match[1]!)));
    graph.set(relative(root, file), [...targets].sort());
  }
  return graph;
}

/** The strongly connected components of more than one file (or a file importing itself): Tarjan 1972, SIAM J. Comput. 1(2):146–160. */
export function fileCycles(graph: Map<string, string[]>): string[][] {
  let counter = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const found: string[][] = [];
  const visit = (v: string): void => {
    index.set(v, counter);
    low.set(v, counter++);
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!graph.has(w)) continue;
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, index.get(w)!));
    }
    if (low.get(v) !== index.get(v)) return;
    const component: string[] = [];
    for (;;) {
      const w = stack.pop()!;
      onStack.delete(w);
      component.push(w);
      if (w === v) break;
    }
    if (component.length > 1 || (graph.get(v) ?? []).includes(v)) found.push(component.sort());
  };
  for (const v of [...graph.keys()].sort()) if (!index.has(v)) visit(v);
  return found;
}

/** Folder of a file under core: its first path segment, or "" for a file at the top of core. */
const folderOf = (file: string): string => (file.includes("/") ? file.slice(0, file.indexOf("/")) : "");

/** Pairs "a ↔ b" of folders of core that import each other (files at the top of core are not a folder). */
export function mutualFolders(graph: Map<string, string[]>): string[] {
  const edges = new Set<string>();
  for (const [file, targets] of graph) {
    for (const target of targets) {
      const a = folderOf(file);
      const b = folderOf(target);
      if (a && b && a !== b) edges.add(`${a}>${b}`);
    }
  }
  const pairs: string[] = [];
  for (const edge of edges) {
    const [a, b] = edge.split(">") as [string, string];
    if (a < b && edges.has(`${b}>${a}`)) pairs.push(`${a} ↔ ${b}`);
  }
  return pairs.sort();
}

/**
 * Imports that climb the layer list: a file of layer `order[a]` importing one of `order[b]` with
 * b > a ("from → to"). Layers are core's folders and its top files (named without ".ts"); a
 * name missing from the list is reported too, so that a new folder must be placed.
 */
export function upwardImports(graph: Map<string, string[]>, order: readonly string[]): string[] {
  const layerOf = (file: string): string => (file.includes("/") ? file.slice(0, file.indexOf("/")) : file.replace(/\.tsx?$/, ""));
  const found = new Set<string>();
  for (const [file, targets] of graph) {
    const from = order.indexOf(layerOf(file));
    if (from < 0) found.add(`${layerOf(file)} is not in the layer list`);
    for (const target of targets) {
      const to = order.indexOf(layerOf(target));
      if (to > from && from >= 0) found.add(`${layerOf(file)} → ${layerOf(target)}`);
    }
  }
  return [...found].sort();
}
