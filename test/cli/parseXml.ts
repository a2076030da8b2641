import { createRequire } from "node:module";

// jsdom's strict XML parser, loaded in a Node test without making the file a jsdom test (jsdom's URL
// global would break fileURLToPath); jsdom ships no types, hence the narrow cast
const { JSDOM } = createRequire(import.meta.url)("jsdom") as { JSDOM: new () => { window: { DOMParser: typeof DOMParser } } };
const parser = new new JSDOM().window.DOMParser();

/** Parses XML text strictly; a document holding a parsererror element means the text was not well-formed. */
export function parseXml(text: string, type: DOMParserSupportedType = "image/svg+xml"): Document {
  return parser.parseFromString(text, type);
}
