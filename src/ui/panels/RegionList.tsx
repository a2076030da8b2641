import { useState } from "react";
import { actions } from "../../state/actions.ts";
import { selectRegionOverlaps } from "../../state/regionSelectors.ts";
import { formatCount, plural } from "../format.ts";
import { outlineStyle, outlineSchemeName } from "../graph/drawRegionMarks.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** The named regions: name (editable), row count, active toggle, its nodes, delete; and the rows each pair shares. */
export function RegionList() {
  const regions = useWorkbench((s) => s.regions);
  const active = useWorkbench((s) => s.activeRegionId);
  const overlaps = useWorkbench(selectRegionOverlaps);
  const [refused, setRefused] = useState<{ id: number; reason: string } | null>(null);
  if (regions.length === 0) return null;
  return (
    <section className="region-list" aria-label="regions">
      <ul>
        {regions.map((region, place) => {
          const { colour, dash } = outlineStyle(place);
          const rename = (field: HTMLInputElement): void => {
            const reason = actions().renameRegion(region.id, field.value);
            if (reason !== null) field.value = region.name;
            setRefused(reason === null ? null : { id: region.id, reason });
          };
          return (
            <li key={region.id} data-testid="region">
              <svg width="22" height="12" aria-hidden="true">
                <title>{outlineSchemeName}</title>
                <line x1="1" y1="6" x2="21" y2="6" stroke={colour} strokeWidth="2.5" strokeDasharray={dash.join(" ")} />
              </svg>
              <input
                aria-label="region name"
                defaultValue={region.name}
                key={region.name}
                onBlur={(e) => rename(e.currentTarget)}
                onKeyDown={(e) => e.key === "Enter" && rename(e.currentTarget)}
              />
              {refused?.id === region.id && <span role="status" className="region-name-refused">{refused.reason}</span>}
              <span data-testid="region-rows">{plural(region.rows.length, "row")}</span>
              <label>
                <input type="checkbox" checked={active === region.id} onChange={(e) => actions().setActiveRegion(e.currentTarget.checked ? region.id : null)} />
                active
              </label>
              <button type="button" onClick={() => actions().selectRegionNodes(region.id)}>Select its nodes</button>
              <button type="button" aria-label={`delete ${region.name}`} onClick={() => actions().deleteRegion(region.id)}>Delete</button>
            </li>
          );
        })}
      </ul>
      {overlaps.map((o, i) => (
        <p key={i} className="region-overlap">
          {o.first} and {o.second} share {formatCount(o.shared)} {o.shared === 1 ? "row" : "rows"}
        </p>
      ))}
    </section>
  );
}
