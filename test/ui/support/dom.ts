import { cleanup } from "@testing-library/react";
import { afterEach, beforeEach } from "vitest";
import { initialState, workbenchStore } from "../../../src/state/store.ts";

/**
 * Imported first by every component test. Vitest runs without globals here, so
 * @testing-library/react cannot register its own cleanup: unmount after each test (which also
 * stops any force simulation) and start each test from the store's initial state.
 */

// jsdom has no 2D context and logs "not implemented" for getContext; the graph skips drawing on null
HTMLCanvasElement.prototype.getContext = (() => null) as typeof HTMLCanvasElement.prototype.getContext;

beforeEach(() => {
  workbenchStore.setState(initialState, true);
});

afterEach(() => {
  cleanup();
  workbenchStore.setState(initialState, true);
});
