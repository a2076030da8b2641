import { describe, expect, it } from "vitest";
import { readParquet } from "../../../../src/core/table/parquet/readParquet.ts";
import { randomSource } from "../../../../src/core/random.ts";
import { parquetLayout, rewriteParquet, intEdit, type IntField } from "./parquetSurgery.ts";
import { bufferOf, dictionaryEncoded, recompressed, snappyFixture } from "./parquetVariants.ts";
import { watchAllocations } from "./watchAllocations.ts";

// Damaged and hostile variants of the mixed-columns fixture in four codecs (two of them also with
// a dictionary-encoded column), made by a seeded
// generator: each must end in a table or in one plain Error with a lowercase message, within a
// second, without any single allocation past a stated bound.

const bases = [
  { codec: "SNAPPY", bytes: snappyFixture },
  { codec: "GZIP", bytes: recompressed("GZIP") },
  { codec: "ZSTD", bytes: recompressed("ZSTD") },
  { codec: "UNCOMPRESSED", bytes: recompressed("UNCOMPRESSED") },
  { codec: "GZIP with a dictionary", bytes: dictionaryEncoded("GZIP") },
  { codec: "UNCOMPRESSED with a dictionary", bytes: dictionaryEncoded("UNCOMPRESSED") },
];

type Random = () => number;
const pick = <T>(random: Random, items: readonly T[]): T => items[Math.floor(random() * items.length)]!;
const below = (random: Random, n: number): number => Math.floor(random() * n);

/** Values a liar would declare: huge, negative, just past the truth, or zero. */
function lie(random: Random, truth: bigint): bigint {
  return pick(random, [2n ** 31n - 1n, 2n ** 30n, 2n ** 53n + 1n, 2n ** 62n, -1n, -(2n ** 31n), truth * 1000n + 7n, truth + 1n, truth - 1n, 0n, 1_000_000n]);
}

function uleb128(value: number): number[] {
  const bytes: number[] = [];
  do {
    const low = value % 128;
    value = Math.floor(value / 128);
    bytes.push(value ? low | 0x80 : low);
  } while (value);
  return bytes;
}

/** One run header of the RLE / bit-packing hybrid, large or random, then up to 3 random bytes. */
function hostileRuns(random: Random): number[] {
  const header = pick(random, [2 ** 31, 2 ** 30 + 1, 2 ** 21, 2 ** 32 - 1, 3, 8, below(random, 2 ** 32)]); // even: an RLE run of header/2; odd: header>>1 bit-packed groups
  return [...uleb128(header), ...Array.from({ length: below(random, 4) }, () => below(random, 256))];
}

const mutations = {
  truncate: (random: Random, bytes: Uint8Array) => bytes.slice(0, below(random, bytes.length)),
  cutData: (random: Random, bytes: Uint8Array) => {
    const footerStart = parquetLayout(bytes).footerStart;
    const from = 4 + below(random, footerStart - 4);
    return Uint8Array.from([...bytes.subarray(0, from), ...bytes.subarray(from + 1 + below(random, 40))]);
  },
  flipBytes: (random: Random, bytes: Uint8Array) => {
    const out = bytes.slice();
    const inFooter = random() < 0.5;
    const footerStart = parquetLayout(bytes).footerStart;
    for (let k = 1 + below(random, 6); k > 0; --k) {
      const at = inFooter ? footerStart + below(random, out.length - 8 - footerStart) : below(random, out.length);
      out[at]! ^= 1 + below(random, 255);
    }
    return out;
  },
  footerLength: (random: Random, bytes: Uint8Array) => {
    const out = bytes.slice();
    const n = out.length;
    const length = pick(random, [0, 1, n - 12, n - 11, n - 8, n, 2 ** 32 - 1, 2 ** 31, below(random, n), below(random, 2 ** 32)]);
    new DataView(out.buffer).setUint32(n - 8, length, true);
    return out;
  },
  footerSize: (random: Random, bytes: Uint8Array) => {
    const layout = parquetLayout(bytes);
    const sizes = layout.footer.filter((f) => /^(3|4\.\d+\.3|4\.\d+\.1\.\d+\.3\.(5|6|7|9|11)|2\.\d+\.(2|5))$/.test(f.path));
    const field = pick(random, sizes);
    return rewriteParquet(layout, [], new Map([[field.path, lie(random, field.value)]]));
  },
  pageSize: (random: Random, bytes: Uint8Array) => {
    const layout = parquetLayout(bytes);
    const fields: IntField[] = layout.pages.flatMap((p) => p.fields.filter((f) => /^(2|3|7\.1|8\.(1|2|3|4|5|6))$/.test(f.path)));
    const field = pick(random, fields);
    return rewriteParquet(layout, [intEdit(field, lie(random, field.value))]);
  },
  levelRun: (random: Random, bytes: Uint8Array) => {
    // the definition levels of a DATA_PAGE_V2 lead its body uncompressed: replace them with one run
    const layout = parquetLayout(bytes);
    const page = pick(random, layout.pages.filter((p) => p.fields.some((f) => f.path === "8.5")));
    const field = (path: string): IntField => page.fields.find((f) => f.path === path)!;
    const levels = hostileRuns(random);
    const old = Number(field("8.5").value);
    const growth = BigInt(levels.length - old);
    return rewriteParquet(layout, [
      { start: page.bodyStart + Number(field("8.6").value), end: page.bodyStart + old, bytes: Uint8Array.from(levels) },
      intEdit(field("8.5"), BigInt(levels.length)),
      intEdit(field("3"), field("3").value + growth),
      intEdit(field("2"), field("2").value + growth),
    ]);
  },
  indexRun: (random: Random) => dictionaryEncoded(pick(random, ["GZIP", "UNCOMPRESSED"] as const), hostileRuns(random)),
  codec: (random: Random, bytes: Uint8Array) => {
    const layout = parquetLayout(bytes);
    const codecs = layout.footer.filter((f) => /^4\.\d+\.1\.\d+\.3\.4$/.test(f.path));
    const chosen = random() < 0.5 ? codecs : [pick(random, codecs)];
    const id = BigInt(pick(random, [0, 1, 2, 3, 4, 5, 6, 7, 8, 99, -1])); // 0–7 are the format's codecs (Apache Parquet format, CompressionCodec)
    return rewriteParquet(layout, [], new Map(chosen.map((f) => [f.path, id])));
  },
};
type Mutation = keyof typeof mutations;

describe("readParquet: fuzz", () => {
  it("600 damaged files (9 kinds × 6 bases, seed 2026) each end in a table or one plain lowercase Error; no allocation passes 16 MiB (the slowest file's time is printed, not asserted)", async () => {
    const random = randomSource(2026);
    const outcomes = new Map<string, number>();
    const watch = watchAllocations();
    let slowest = 0;
    try {
      for (let i = 0; i < 600; ++i) {
        const kind = pick(random, Object.keys(mutations) as Mutation[]);
        const base = pick(random, bases);
        const bytes = mutations[kind](random, base.bytes);
        const started = performance.now();
        let outcome: string;
        try {
          const { table } = await readParquet(bufferOf(bytes));
          outcome = `table of ${table.rows} rows`;
        } catch (error) {
          expect(error, `${kind} ${base.codec} #${i}`).toBeInstanceOf(Error);
          expect((error as Error).constructor, `${kind} ${base.codec} #${i}: ${String(error)}`).toBe(Error); // not a RangeError or TypeError from deep inside
          expect((error as Error).message).toMatch(/^[a-z][^\n]*$/);
          outcome = (error as Error).message.replace(/-?\d+/g, "N");
        }
        const elapsed = performance.now() - started;
        slowest = Math.max(slowest, elapsed);
        outcomes.set(`${kind}: ${outcome}`, (outcomes.get(`${kind}: ${outcome}`) ?? 0) + 1);
      }
    } finally {
      watch.stop();
    }
    expect(watch.largest()).toBeLessThanOrEqual(2 ** 24); // 16 MiB: the files are under 2 kB, pages decompress to at most the 1 MiB floor
    const seen = [...outcomes.keys()].join("\n");
    expect(seen).toMatch(/unsupported parquet codec: /);
    expect(seen).toMatch(/invalid parquet footer length: /);
    expect(seen).toMatch(/bytes decompressed \(the limit is /);
    expect(seen).toMatch(/levelRun: .*a run declares/);
    expect(seen).toMatch(/indexRun: .*a run declares/);
    expect(seen).toMatch(/: table of /);
    console.log(`slowest file ${slowest.toFixed(1)} ms; largest allocation ${watch.largest()} bytes\n${[...outcomes].sort().map(([k, v]) => `${v}\t${k}`).join("\n")}`);
  }, 120_000);
});
