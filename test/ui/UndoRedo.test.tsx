import "./support/dom.ts";
import { act, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { actions } from "../../src/state/actions.ts";
import { workbenchStore } from "../../src/state/store.ts";
import { historyKey, isTextField, UndoRedo } from "../../src/ui/panels/UndoRedo.tsx";
import { loadSmallTable, smallRadius } from "./support/smallTable.ts";

const press = (key: string, modifiers: { ctrlKey?: boolean; metaKey?: boolean; shiftKey?: boolean; altKey?: boolean } = {}) => ({ key, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...modifiers });

describe("historyKey", () => {
  it("Ctrl+Z and ⌘+Z undo; Ctrl+Shift+Z and Ctrl+Y redo; a plain Z, Alt+Ctrl+Z and Ctrl+Shift+Y do nothing", () => {
    expect(historyKey(press("z", { ctrlKey: true }))).toBe("undo");
    expect(historyKey(press("z", { metaKey: true }))).toBe("undo");
    expect(historyKey(press("Z", { ctrlKey: true, shiftKey: true }))).toBe("redo");
    expect(historyKey(press("y", { ctrlKey: true }))).toBe("redo");
    expect([historyKey(press("z")), historyKey(press("z", { ctrlKey: true, altKey: true })), historyKey(press("Y", { ctrlKey: true, shiftKey: true }))]).toEqual([null, null, null]);
  });
});

describe("isTextField", () => {
  it("text, number and search inputs, text areas and editable elements are text fields; checkboxes, ranges, selects and buttons are not", () => {
    const make = (html: string): Element => {
      const holder = document.createElement("div");
      holder.innerHTML = html;
      return holder.firstElementChild!;
    };
    const fields = ['<input type="text">', '<input type="number">', '<input type="search">', "<textarea></textarea>", "<input>"].map(make);
    expect(fields.map(isTextField)).toEqual([true, true, true, true, true]);
    const others = ['<input type="checkbox">', '<input type="range">', "<select></select>", "<button></button>"].map(make);
    expect(others.map(isTextField)).toEqual([false, false, false, false]);
  });
});

describe("UndoRedo", () => {
  it("both buttons start disabled; after a radius change Undo is enabled, and Ctrl+Z outside a text field takes the radius back to 1.4", async () => {
    render(<UndoRedo />);
    const undo = screen.getByRole("button", { name: "Undo" }) as HTMLButtonElement;
    const redo = screen.getByRole("button", { name: "Redo" }) as HTMLButtonElement;
    expect([undo.disabled, redo.disabled]).toEqual([true, true]);
    await loadSmallTable();
    await act(async () => {
      await actions().setRadius(2);
    });
    await waitFor(() => expect(undo.disabled).toBe(false));

    const field = document.body.appendChild(document.createElement("input"));
    fireEvent.keyDown(field, { key: "z", ctrlKey: true }); // the browser's own undo of typed text applies here
    await act(() => new Promise((resolve) => setTimeout(resolve, 10)));
    expect(workbenchStore.getState().radius).toBe(2);

    fireEvent.keyDown(document.body, { key: "z", ctrlKey: true });
    await waitFor(() => expect(workbenchStore.getState().radius).toBe(smallRadius));
    await waitFor(() => expect(redo.disabled).toBe(false));
    field.remove();
  });
});
