import "./support/dom.ts";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { render, screen } from "@testing-library/react";
import { expect, it } from "vitest";
import { App } from "../../src/ui/App.tsx";
import { loadSmallTable } from "./support/smallTable.ts";

const footerText = (): string => (screen.getByRole("contentinfo", { name: "cautions" }).textContent ?? "").replace(/\s+/g, " ");

/** The sentences of the README's "Read with care" bullets, markdown emphasis removed. */
function readmeCautionSentences(): string[] {
  const readme = readFileSync(join(process.cwd(), "README.md"), "utf8") // vitest runs from the repository root;
  const section = readme.split("## Read with care")[1]!.split("\n## ")[0]!;
  const bullets = section.split("\n").filter((line) => line.startsWith("- ")).map((line) => line.slice(2).replaceAll("**", ""));
  return bullets.flatMap(sentencesOf);
}

/** Splits at ". " or a final "." (the cautions use no abbreviations); each sentence keeps its period. */
function sentencesOf(text: string): string[] {
  return text.trim().split(/(?<=\.)\s+/).filter((s) => s !== "");
}

function footerSentences(): string[] {
  return Array.from(screen.getByRole("contentinfo", { name: "cautions" }).querySelectorAll("li"), (li) => li.textContent!.replace(/\s+/g, " ")).flatMap(sentencesOf);
}

it("the README's 'Read with care' holds 5 cautions of 10 sentences, among them the three the footer must carry", () => {
  const sentences = readmeCautionSentences();
  expect(sentences).toHaveLength(10); // 5 bullets, each a heading sentence and one more, counted by hand in README.md
  expect(sentences).toContain("The graph depends on the radius, the metric and the scaling; check that a shape persists when they change.");
  expect(sentences).toContain("Shoal sends nothing anywhere, but the exports contain row-level data: follow your organisation's data-protection rules.");
  expect(sentences).toContain("Decisions about individuals need qualified review; a node membership is not a diagnosis or a verdict.");
});

it("before any table is loaded, the footer shows every sentence of the README's cautions, word for word, and no other", () => {
  render(<App openDemo={false} />);
  const readme = readmeCautionSentences();
  for (const sentence of readme) expect(footerText()).toContain(sentence);
  expect(footerSentences()).toEqual(readme);
});

it("with a built graph the footer still shows every sentence of the README's cautions", async () => {
  render(<App openDemo={false} />);
  await loadSmallTable();
  expect(screen.getByRole("application", { name: /cover graph with 3 nodes and 2 edges/ })).toBeTruthy();
  for (const sentence of readmeCautionSentences()) expect(footerText()).toContain(sentence);
});
