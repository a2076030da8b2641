import type { FileFingerprint } from "./fileFingerprint.ts";
import type { RecipeInput } from "./types.ts";

/** True when the file is the one the recipe was made on (same SHA-256 and size; the name may differ). */
export const isRecipeInput = (input: RecipeInput, file: FileFingerprint): boolean => input.sha256 === file.sha256 && input.bytes === file.bytes;

/** The one line that says a recipe meets another file, naming both fingerprints (the workbench and the command say the same). */
export function otherFileLine(input: RecipeInput, fileName: string, file: FileFingerprint): string {
  return `the recipe was made on ${input.name} (sha256 ${input.sha256}, ${input.bytes} bytes), not on this file ${fileName} (sha256 ${file.sha256}, ${file.bytes} bytes)`;
}
