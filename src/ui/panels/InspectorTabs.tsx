import { useState, type KeyboardEvent } from "react";
import { HotspotPane } from "./HotspotPane.tsx";
import { HowToRead } from "./HowToRead.tsx";
import { NodeList } from "./NodeList.tsx";
import { NodePane } from "./NodePane.tsx";
import { RegionPane } from "./RegionPane.tsx";
import { StabilityPane } from "./StabilityPane.tsx";

const tabs = [
  { id: "node", label: "Node" },
  { id: "region", label: "Region" },
  { id: "stability", label: "Stability" },
  { id: "hotspots", label: "Hotspots" },
  { id: "guide", label: "How to read" },
] as const;

/** The side pane: the open node's members, what sets the region apart, the stability evidence, or the outcome hotspots; tabs move with arrow keys. */
export function InspectorTabs() {
  const [active, setActive] = useState<(typeof tabs)[number]["id"]>("node");
  const onKey = (event: KeyboardEvent<HTMLDivElement>): void => {
    if (event.key !== "ArrowRight" && event.key !== "ArrowLeft") return;
    const step = event.key === "ArrowRight" ? 1 : tabs.length - 1;
    const next = tabs[(tabs.findIndex((t) => t.id === active) + step) % tabs.length]!;
    setActive(next.id);
    document.getElementById(`tab-${next.id}`)?.focus();
  };
  return (
    <>
      <div role="tablist" aria-label="side pane" className="tabs" onKeyDown={onKey}>
        {tabs.map((tab) => (
          <button
            key={tab.id}
            id={`tab-${tab.id}`}
            type="button"
            role="tab"
            aria-selected={active === tab.id}
            aria-controls={`panel-${tab.id}`}
            tabIndex={active === tab.id ? 0 : -1}
            onClick={() => setActive(tab.id)}
          >
            {tab.label}
          </button>
        ))}
      </div>
      <div role="tabpanel" id={`panel-${active}`} aria-labelledby={`tab-${active}`}>
        {active === "node" ? (
          <>
            <NodeList />
            <NodePane />
          </>
        ) : active === "region" ? (
          <RegionPane />
        ) : active === "stability" ? (
          <StabilityPane />
        ) : active === "guide" ? (
          <HowToRead />
        ) : (
          <HotspotPane />
        )}
      </div>
    </>
  );
}
