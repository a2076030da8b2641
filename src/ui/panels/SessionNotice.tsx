import { useState } from "react";
import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { formatBytes } from "./formatBytes.ts";

/** "Kept in this browser": what the session keeps and where, the per-table choice to keep its bytes, and "Forget this session". */
export function SessionNotice() {
  const source = useWorkbench((s) => s.source);
  const keepTable = useWorkbench((s) => s.keepTable);
  const kept = useWorkbench((s) => s.kept);
  const error = useWorkbench((s) => s.sessionError);
  const [confirming, setConfirming] = useState(false);
  const canKeepTable = source !== null && !source.isDemo;
  return (
    <details className="session-notice" data-testid="session-notice">
      <summary>Kept in this browser</summary>
      <p>
        As you work, Shoal keeps this session in this browser&apos;s own storage (IndexedDB) for this page&apos;s address ({window.location.origin}): the
        settings, column roles and colour, the named regions and the selection, the graph&apos;s layout, and the file&apos;s name, size and SHA-256
        fingerprint{kept.tableBytes !== null ? ", and the table's bytes" : ""}. After a reload it is restored. Nothing is sent anywhere.
      </p>
      {canKeepTable && (
        <label className="keep-table">
          <input type="checkbox" checked={keepTable} onChange={(event) => void actions().setKeepTable(event.currentTarget.checked)} />
          Keep this table in this browser ({formatBytes(source.fileSize)}), so that no file is asked for after a reload. This writes its rows to this
          computer&apos;s disk.
        </label>
      )}
      {kept.tableBytes !== null && <p className="note" data-testid="kept-bytes">Table bytes kept: {formatBytes(kept.tableBytes)}.</p>}
      {confirming ? (
        <p role="group" aria-label="confirm forgetting">
          Delete everything kept in this browser for this page?{" "}
          <button
            type="button"
            onClick={() => {
              setConfirming(false);
              void actions().forgetSession();
            }}
          >
            Forget
          </button>{" "}
          <button type="button" onClick={() => setConfirming(false)}>Keep it</button>
        </p>
      ) : (
        <button type="button" onClick={() => setConfirming(true)} disabled={!kept.session && kept.tableBytes === null}>
          Forget this session…
        </button>
      )}
      {!kept.session && kept.tableBytes === null && <p className="note" data-testid="nothing-kept">Nothing is kept now; your next change is kept again.</p>}
      {error && <p role="alert" className="error">{error}</p>}
    </details>
  );
}
