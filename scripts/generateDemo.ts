// Writes the invented demo table public/demo/pump-fleet.csv from its seeded generator.
// Run with `npm run demo:generate`; the committed file must equal the output (test/core/demo/pumpFleet.test.ts).
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname, relative } from "node:path";
import { fileURLToPath } from "node:url";
import { generatePumpFleet, pumpFleetSeed, pumpFleetSize } from "../src/core/demo/pumpFleet.ts";

const target = fileURLToPath(new URL("../public/demo/pump-fleet.csv", import.meta.url));
const text = generatePumpFleet({ seed: pumpFleetSeed, pumps: pumpFleetSize });
mkdirSync(dirname(target), { recursive: true });
writeFileSync(target, text, "utf8");
console.log(`wrote ${relative(process.cwd(), target)}: ${pumpFleetSize} pumps, seed ${pumpFleetSeed}, ${text.length} bytes`);
