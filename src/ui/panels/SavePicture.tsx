import { useState } from "react";
import { pictureSvg } from "../../core/picture/pictureSvg.ts";
import { fileStem } from "../../state/answerError.ts";
import { workbenchStore } from "../../state/store.ts";
import { downloadBytes } from "../download.ts";
import { currentPictureSource } from "../graph/pictureSource.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { pictureFromView, svgToPng } from "./pictureFromView.ts";

type Format = "svg" | "png";

/** "Save picture": the graph as drawn, with its legend, region outlines and a caption of the build, as SVG or as PNG at 1×, 2× or 3×. */
export function SavePicture() {
  const ready = useWorkbench((s) => s.result !== null);
  const [format, setFormat] = useState<Format>("svg");
  const [density, setDensity] = useState(2);
  const [greyscale, setGreyscale] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const save = async (): Promise<void> => {
    setError(null);
    try {
      const source = currentPictureSource();
      const layout = source?.layout();
      const canvas = source?.canvas();
      if (!layout || !canvas) throw new Error("no graph is drawn (raise the radius if it has too many nodes)");
      const state = workbenchStore.getState();
      const input = pictureFromView(state, layout, { width: canvas.clientWidth, height: canvas.clientHeight }, greyscale);
      if (!input) throw new Error("nothing is built yet");
      const svg = pictureSvg(input);
      const name = `${fileStem(input.facts.fileName)}-graph-r${input.facts.radius}${greyscale ? "-grey" : ""}`;
      if (format === "svg") downloadBytes(`${name}.svg`, new TextEncoder().encode(svg), "image/svg+xml");
      else downloadBytes(`${name}@${density}x.png`, await svgToPng(svg, input.width, input.height, density), "image/png");
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : String(caught));
    }
  };

  return (
    <details className="save-picture" data-testid="save-picture">
      <summary aria-disabled={!ready}>Save picture</summary>
      <fieldset disabled={!ready}>
        <legend>The graph with its legend, region outlines and a caption of the build</legend>
        <label>
          <input type="radio" name="picture-format" checked={format === "svg"} onChange={() => setFormat("svg")} /> SVG (text stays text)
        </label>
        <label>
          <input type="radio" name="picture-format" checked={format === "png"} onChange={() => setFormat("png")} /> PNG
        </label>
        <label>
          pixel density
          <select value={density} disabled={format !== "png"} onChange={(e) => setDensity(Number(e.currentTarget.value))}>
            <option value={1}>1×</option>
            <option value={2}>2×</option>
            <option value={3}>3×</option>
          </select>
        </label>
        <label title="Categories become numbered grey steps and regions differ by dash pattern; the legend says that lightness increases with value">
          <input type="checkbox" checked={greyscale} onChange={(e) => setGreyscale(e.currentTarget.checked)} /> greyscale-safe
        </label>
        <button type="button" onClick={() => void save()}>Save {format.toUpperCase()}</button>
      </fieldset>
      {error && <span role="alert" className="error">Could not save the picture: {error}</span>}
    </details>
  );
}
