import { actions } from "../../state/actions.ts";
import type { ColumnRole } from "../../state/slices/paramsSlice.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { roleLabel } from "./roleLabel.ts";
import { WeightField } from "./WeightField.tsx";

const numericRoles: readonly ColumnRole[] = ["feature", "outcome", "id", "ignore"];
const textRoles: readonly ColumnRole[] = ["id", "ignore"];
const categoricalRoles: readonly ColumnRole[] = ["feature", "id", "ignore"];

/** Every column with its role: features span the space; outcomes are only summarised and coloured. */
export function ColumnRoles() {
  const table = useWorkbench((s) => s.table);
  const roles = useWorkbench((s) => s.roles);
  if (!table) return null;
  return (
    <fieldset className="column-roles">
      <legend>Columns</legend>
      <p className="note">
        Role, and weight (× after scaling) for features. A categorical feature adds one 0/1 column per level, worth its weight and never
        scaled.
      </p>
      <ul>
        {table.columns.map((column) => (
          <li key={column.name}>
            <label>
              <span className="column-name" title={`${column.kind}; ${column.missing} missing`}>
                {column.name}
                {column.missing > 0 && <span className="missing-count"> ({column.missing} missing)</span>}
              </span>
              <select
                aria-label={`role of ${column.name}`}
                value={roles[column.name] ?? "ignore"}
                onChange={(event) => void actions().setRole(column.name, event.currentTarget.value as ColumnRole)}
              >
                {(column.kind === "numeric" ? numericRoles : column.categories ? categoricalRoles : textRoles).map((role) => (
                  <option key={role} value={role}>{roleLabel(role, column.kind === "numeric")}</option>
                ))}
              </select>
              {roles[column.name] === "feature" ? <WeightField column={column.name} /> : <span className="weight" />}
            </label>
          </li>
        ))}
      </ul>
    </fieldset>
  );
}
