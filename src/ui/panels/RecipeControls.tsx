import { useRef, useState } from "react";
import { actions } from "../../state/actions.ts";
import type { RecipeOutcome } from "../../state/recipeActions.ts";
import { selectCanWriteRecipe } from "../../state/recipeFromState.ts";
import { downloadBytes } from "../download.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { HiddenFileInput, tableFileTypes } from "./HiddenFileInput.tsx";

/**
 * "Save recipe" writes how the graph on screen was made (recipe.json, README "Recipes");
 * "Open recipe…" applies one to the loaded table, all or nothing. A recipe made on other bytes is
 * held back with both fingerprints until "Apply anyway".
 */
export function RecipeControls() {
  const canSave = useWorkbench(selectCanWriteRecipe);
  const hasTable = useWorkbench((s) => s.table !== null);
  const input = useRef<HTMLInputElement>(null);
  const tableInput = useRef<HTMLInputElement>(null);
  const [opened, setOpened] = useState<{ readonly text: string; readonly outcome: RecipeOutcome } | null>(null);
  const open = async (text: string, allowOtherFile = false): Promise<void> => {
    setOpened({ text, outcome: await actions().openRecipe(text, { allowOtherFile }) });
  };
  const save = (): void => {
    const file = actions().recipeFile();
    if (file) downloadBytes(file.fileName, new TextEncoder().encode(file.text), "application/json");
  };
  const outcome = opened?.outcome;
  return (
    <span className="recipe-controls">
      <button type="button" disabled={!canSave} title="Every setting of the graph on screen, and the fingerprint of its file, as JSON" onClick={save}>
        Save recipe
      </button>
      <button type="button" onClick={() => input.current?.click()} title="Apply a saved recipe to the loaded table">
        Open recipe…
      </button>
      <HiddenFileInput inputRef={input} accept=".json,application/json" testId="recipe-input" onFile={(file) => void file.text().then((text) => open(text))} />
      {outcome?.kind === "applied" && (
        <span className="note recipe-message" data-testid="recipe-status">
          Recipe applied
          <button type="button" className="quiet" aria-label="close" onClick={() => setOpened(null)}>×</button>
        </span>
      )}
      {outcome?.kind === "refused" && (
        <span role="alert" className="error recipe-message">
          Recipe not applied: {outcome.message}
          {!hasTable && <button type="button" onClick={() => tableInput.current?.click()}>Open the table…</button>}
          <button type="button" className="quiet" aria-label="close" onClick={() => setOpened(null)}>×</button>
        </span>
      )}
      <HiddenFileInput
        inputRef={tableInput}
        accept={tableFileTypes}
        testId="recipe-table-input"
        // the table first, then the recipe that asked for it
        onFile={(file) => void (opened && actions().loadFile(file).then(() => open(opened.text)))}
      />
      {outcome?.kind === "other-file" && opened && (
        <span role="alert" className="error recipe-message" data-testid="recipe-other-file">
          This recipe belongs to another file: {outcome.line}.
          <button type="button" onClick={() => void open(opened.text, true)}>Apply anyway</button>
          <button type="button" onClick={() => setOpened(null)}>Keep the current settings</button>
        </span>
      )}
    </span>
  );
}
