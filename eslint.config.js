// Lint rules that keep the architecture: one-way dependencies between folders, no import
// cycles, a pure core/, features that do not reach into each other.
import { readdirSync } from "node:fs";
import js from "@eslint/js";
import { createNodeResolver, flatConfigs as importX } from "eslint-plugin-import-x";
import reactHooks from "eslint-plugin-react-hooks";
import globals from "globals";
import tseslint from "typescript-eslint";

const features = readdirSync(new URL("./web/src/features", import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);
const routeFolders = readdirSync(new URL("./api/routes", import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

export default tseslint.config(
  { ignores: ["node_modules", "dist", ".data", "test-results", "coverage"] },
  js.configs.recommended,
  tseslint.configs.recommended,
  importX.recommended,
  importX.typescript,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    settings: {
      "import-x/resolver-next": [createNodeResolver({ extensions: [".ts", ".tsx", ".js", ".mjs", ".json"] })],
    },
    rules: {
      "import-x/no-cycle": "error",
      "import-x/no-unresolved": ["error", { ignore: ["\\.css$"] }],
      "import-x/no-named-as-default-member": "off",
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
      "import-x/no-restricted-paths": [
        "error",
        {
          zones: [
            // core/ ← db/ ← api/; web/ uses core/ only.
            {
              target: "./core",
              from: ["./web", "./api", "./db", "./test", "./scripts"],
              message: "core/ imports nothing from other folders.",
            },
            { target: "./db", from: ["./api", "./web", "./test"], message: "db/ may use core/ only." },
            { target: "./api", from: ["./web", "./test"], message: "api/ may use db/ and core/ only." },
            {
              target: "./web",
              from: ["./api", "./db", "./scripts", "./test"],
              message: "web/ may use core/ (and its shared schemas) only.",
            },
            // Route folders keep schema, handlers and presenter; what two of them share lives in
            // api/domain/<area>/ (or db/repositories/), and api/routes/*.ts files mount them.
            ...routeFolders.map((folder) => ({
              target: `./api/routes/${folder}`,
              from: "./api/routes",
              except: [`./${folder}`],
              message: "Route folders do not import each other; move what they share to api/domain/<area>/.",
            })),
            // Routes read and write through db/repositories/ (plain rows). Still on the models, to move next:
            // auth, invitations, share-links (and comparison's one SQL statement, moving to api/domain/).
            ...routeFolders
              .filter((folder) => !["auth", "invitations", "share-links", "comparison"].includes(folder))
              .map((folder) => ({
                target: `./api/routes/${folder}`,
                from: "./db/models",
                message: "Routes use db/repositories/, not the models.",
              })),
            {
              target: "./api/domain",
              from: "./api/routes",
              message: "api/domain/ is used by routes, never the reverse.",
            },
            // Features do not import each other; web/src/app composes them.
            ...features.map((feature) => ({
              target: `./web/src/features/${feature}`,
              from: "./web/src/features",
              except: [`./${feature}`],
              message: "Features do not import each other; compose them in web/src/app.",
            })),
          ],
        },
      ],
    },
  },
  {
    // core/ is pure TypeScript: no Node APIs, no DOM (tests beside it may use Node to read fixtures).
    files: ["core/**/*.ts"],
    ignores: ["core/**/*.test.ts"],
    languageOptions: { globals: {} },
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              regex: "^node:|^(fs|path|os|crypto|child_process|url|util|stream)$",
              message: "core/ uses no Node APIs.",
            },
          ],
        },
      ],
      "no-restricted-globals": [
        "error",
        "window",
        "document",
        "process",
        "Buffer",
        "require",
        "navigator",
        "localStorage",
      ],
    },
  },
  {
    files: ["web/**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks },
    rules: reactHooks.configs.recommended.rules,
  },
);
