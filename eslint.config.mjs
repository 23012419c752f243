// Flat ESLint config shared by every workspace package.
import js from "@eslint/js";
import tseslint from "typescript-eslint";
import reactHooks from "eslint-plugin-react-hooks";
import globals from "globals";
import boundaries from "eslint-plugin-boundaries";

export default tseslint.config(
  { ignores: ["**/dist/**", "**/node_modules/**", "**/.turbo/**", "data/**", "test-results/**"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  {
    files: ["apps/web/src/**/*.{ts,tsx}"],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { "react-hooks": reactHooks },
    rules: { ...reactHooks.configs.recommended.rules },
  },
  {
    // Environment variables are read in one place per app (src/config/env.ts).
    files: ["apps/api/src/**/*.ts"],
    ignores: ["apps/api/src/config/env.ts", "apps/api/src/**/*.test.ts"],
    rules: {
      "no-restricted-properties": [
        "error",
        { object: "process", property: "env", message: "Read settings from src/config/env.ts." },
      ],
    },
  },
  {
    // The web app's layers (DEVELOPERS.md, "Web"): shared pieces (components, lib, config, hooks,
    // utils) import only shared pieces; a feature imports shared pieces and itself, never another
    // feature (shapes they share come from @waymark/contract and @waymark/stats); app/ wires
    // features into pages. src/test is test support and may import anything it sets up.
    files: ["apps/web/src/**/*.{ts,tsx}"],
    plugins: { boundaries },
    settings: {
      "import/resolver": { typescript: { project: "apps/web/tsconfig.json" } },
      "boundaries/elements": [
        { type: "shared", pattern: "apps/web/src/{components,lib,config,hooks,utils,styles}" },
        { type: "feature", pattern: "apps/web/src/features/*", capture: ["name"] },
        { type: "app", pattern: "apps/web/src/app" },
        { type: "test-support", pattern: "apps/web/src/test" },
      ],
    },
    rules: {
      "boundaries/dependencies": [
        "error",
        {
          default: "disallow",
          policies: [
            { from: { element: { type: "shared" } }, allow: { to: { element: { type: "shared" } } } },
            {
              from: { element: { type: "feature" } },
              allow: { to: { element: { type: "shared" } } },
            },
            {
              from: { element: { type: "feature" } },
              allow: {
                to: { element: { type: "feature", captured: { name: "{{ from.element.captured.name }}" } } },
              },
            },
            {
              from: { element: { type: "feature" } },
              allow: { to: { element: { type: "test-support" } } },
            },
            {
              from: { element: { type: "app" } },
              allow: { to: { element: { types: { anyOf: ["shared", "feature", "app"] } } } },
            },
            {
              from: { element: { type: "test-support" } },
              allow: { to: { element: { types: { anyOf: ["shared", "feature", "app", "test-support"] } } } },
            },
          ],
        },
      ],
    },
  },
);
