import { useEffect, useState } from "react";
import { actions } from "../state/actions.ts";

/** Accepts a file dropped anywhere on the page; shows a veil while something is dragged over. */
export function DropZone() {
  const [over, setOver] = useState(false);
  useEffect(() => {
    const onOver = (event: DragEvent): void => {
      if (!event.dataTransfer?.types.includes("Files")) return;
      event.preventDefault();
      setOver(true);
    };
    const onLeave = (event: DragEvent): void => {
      if (event.relatedTarget === null) setOver(false);
    };
    const onDrop = (event: DragEvent): void => {
      event.preventDefault();
      setOver(false);
      const file = event.dataTransfer?.files[0];
      if (file) void actions().loadFile(file);
    };
    window.addEventListener("dragover", onOver);
    window.addEventListener("dragleave", onLeave);
    window.addEventListener("drop", onDrop);
    return () => {
      window.removeEventListener("dragover", onOver);
      window.removeEventListener("dragleave", onLeave);
      window.removeEventListener("drop", onDrop);
    };
  }, []);
  if (!over) return null;
  return <div className="drop-veil">Release to read this table here. Nothing is uploaded.</div>;
}
