import js from "@eslint/js";
import tseslint from "typescript-eslint";
import globals from "globals";

// Layer direction: ui -> state -> worker -> core, and cli -> core. A value import against that
// direction fails lint; type-only imports are allowed (they vanish at compile time).
const against = (message, ...group) => ({
  "no-restricted-imports": ["error", { patterns: [{ group, message, allowTypeImports: true }] }],
});
const up = (...layers) => layers.flatMap((l) => [`**/${l}/**`, `**/${l}`, `**/${l}.ts`, `**/${l}.tsx`]);

export default tseslint.config(
  { ignores: ["dist/**", "cli-build/**", "node_modules/**", "coverage/**", "public/**"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      "@typescript-eslint/consistent-type-imports": "error",
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", destructuredArrayIgnorePattern: "^_" }],
    },
  },
  {
    files: ["src/core/**"],
    rules: {
      ...against("core is pure: it imports no other layer, no React and no DOM helpers", ...up("worker", "state", "ui", "cli"), "react", "react-dom", "react-dom/*", "zustand", "zustand/*", "d3-selection"),
    },
  },
  {
    files: ["src/worker/**"],
    rules: { ...against("worker sits on core only", ...up("state", "ui", "cli"), "react", "zustand") },
  },
  {
    files: ["src/state/**"],
    rules: { ...against("state may use worker and core, never ui or cli", ...up("ui", "cli"), "react") },
  },
  {
    files: ["src/ui/**"],
    rules: { ...against("ui goes through state; it never calls the worker or the cli directly", ...up("worker", "cli")) },
  },
  {
    files: ["src/cli/**"],
    rules: { ...against("cli runs over core only", ...up("worker", "state", "ui"), "react", "zustand") },
  },
);
