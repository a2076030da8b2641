import type { RefObject } from "react";

/** The file types the workbench reads as a table (CSV, TSV, text, Parquet). */
export const tableFileTypes = ".csv,.tsv,.txt,.parquet,text/csv,text/tab-separated-values";

/**
 * A hidden file input that a visible button opens (`inputRef.current.click()`); hands on the
 * chosen file and clears itself, so choosing the same file again fires once more.
 */
export function HiddenFileInput({ inputRef, accept, testId, onFile }: {
  readonly inputRef: RefObject<HTMLInputElement | null>;
  readonly accept?: string;
  readonly testId: string;
  readonly onFile: (file: File) => void;
}) {
  return (
    <input
      ref={inputRef}
      type="file"
      {...(accept === undefined ? {} : { accept })}
      hidden
      data-testid={testId}
      onChange={(event) => {
        const file = event.currentTarget.files?.[0];
        if (file) onFile(file);
        event.currentTarget.value = "";
      }}
    />
  );
}
