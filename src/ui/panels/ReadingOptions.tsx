import { delimiterLabels, type ByteReadOptions, type TableFormat } from "../../core/index.ts";
import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";

const delimiterLabel: Readonly<Record<string, string>> = delimiterLabels;

/** How the file was read (detected or chosen) and the controls to read it again differently. */
export function ReadingOptions() {
  const report = useWorkbench((s) => s.report);
  const options = useWorkbench((s) => s.readOptions);
  const isDemo = useWorkbench((s) => s.source?.isDemo ?? false);
  if (!report) return null;
  const format: TableFormat = report.format;
  const reread = (patch: Partial<ByteReadOptions>): void => {
    const next: Record<string, unknown> = { ...options, ...patch };
    for (const key of Object.keys(next)) if (next[key] === "") delete next[key];
    void actions().reload(next as ByteReadOptions);
  };
  if (format.kind === "parquet") return <p className="note">Read as Parquet.</p>;
  return (
    <fieldset className="reading-options" disabled={isDemo}>
      <legend>Reading</legend>
      <label>
        Delimiter
        <select value={options.delimiter ?? ""} onChange={(e) => reread({ delimiter: e.currentTarget.value as ByteReadOptions["delimiter"] & string })}>
          <option value="">detected: {delimiterLabel[format.delimiter]}</option>
          {Object.entries(delimiterLabel).map(([d, label]) => <option key={label} value={d}>{label}</option>)}
        </select>
      </label>
      <label>
        Decimal mark
        <select value={options.decimal ?? ""} onChange={(e) => reread({ decimal: e.currentTarget.value as ByteReadOptions["decimal"] & string })}>
          <option value="">detected: {format.decimal === "," ? "comma" : "point"}</option>
          <option value=".">point (1.5)</option>
          <option value=",">comma (1,5)</option>
        </select>
      </label>
      <label>
        Encoding
        <select value={options.encoding ?? ""} onChange={(e) => reread({ encoding: e.currentTarget.value as ByteReadOptions["encoding"] & string })}>
          <option value="">detected</option>
          <option value="utf-8">UTF-8</option>
          <option value="windows-1252">Windows-1252</option>
        </select>
      </label>
      <label>
        Rows with too few or too many fields
        <select value={options.ragged ?? ""} onChange={(e) => reread({ ragged: e.currentTarget.value as ByteReadOptions["ragged"] & string })}>
          <option value="">refuse the file</option>
          <option value="pad">pad or cut, with a notice</option>
        </select>
      </label>
    </fieldset>
  );
}
