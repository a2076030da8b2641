import { useRef } from "react";
import { actions } from "../../state/actions.ts";
import type { KeptFile } from "../../state/slices/sessionSlice.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { formatBytes } from "./formatBytes.ts";
import { HiddenFileInput } from "./HiddenFileInput.tsx";

const fileLine = (file: KeptFile): string => `${file.name} (${formatBytes(file.bytes)}, sha256 ${file.sha256?.slice(0, 12) ?? "unknown"})`;

/** Restoring the session kept in this browser: progress, the request for its file, the other-file warning, or why it failed. */
export function SessionRestorePrompt() {
  const restore = useWorkbench((s) => s.sessionRestore);
  const input = useRef<HTMLInputElement>(null);
  if (restore.state === "none" || restore.state === "checking") return null;
  const afresh = (
    <button type="button" onClick={() => void actions().startAfresh()}>
      Start afresh
    </button>
  );
  return (
    <section className="session-restore" aria-label="kept session" data-testid="session-restore">
      {restore.state === "restoring" && <p role="status">Restoring the session kept for {restore.file.name}…</p>}
      {restore.state === "needs-file" && (
        <>
          <p>
            Open <strong>{fileLine(restore.file)}</strong> to restore the session kept in this browser. Its bytes were not kept, so the file is
            needed again; it is read here and checked by its fingerprint.
          </p>
          <button type="button" onClick={() => input.current?.click()}>Open {restore.file.name}…</button>
          <HiddenFileInput inputRef={input} testId="session-file-input" onFile={(file) => void actions().restoreFromFile(file)} />
          {afresh}
        </>
      )}
      {restore.state === "other-file" && (
        <div role="alert" className="warning">
          <p>This file is not the one the session was kept for: its SHA-256 differs.</p>
          <dl className="fingerprints">
            <dt>kept for</dt>
            <dd><code>{restore.file.sha256 ?? "unknown"}</code> ({restore.file.name})</dd>
            <dt>this file</dt>
            <dd><code>{restore.foundSha256 ?? "unknown"}</code></dd>
          </dl>
          <button type="button" onClick={() => void actions().applyAnyway()}>Apply the session anyway</button>
          {afresh}
        </div>
      )}
      {restore.state === "failed" && (
        <div role="alert" className="error">
          <p>The kept session could not be restored: {restore.error}</p>
          {afresh}
        </div>
      )}
    </section>
  );
}
