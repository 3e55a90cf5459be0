// Lint rules that keep the architecture: one-way dependencies between folders, no import
// cycles, a pure core/, features that do not reach into each other, entities below features.
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

const coreImportsNothingOutside = {
  target: "./core",
  from: ["./web", "./api", "./db", "./test", "./scripts"],
  message: "core/ imports nothing from other folders.",
};

// core/'s folders in layers, bottom first. A folder imports its own files and the layers below
// it, never a folder of its own layer or above, so core's folders cannot form a cycle
// (import-x/no-cycle sees files only). What sits above the last layer — calculators/, diagrams/,
// demo-data/, index.ts and any new folder — may import every layer. Test files are not held to it:
// nothing imports a test, so a test closes no cycle, and a test may check a layer against a higher one.
const CORE_LAYERS = [
  ["constants"], // the lists and bounds the wire schemas share with the engine; imports nothing
  ["tolerances.ts", "units"],
  ["eigen"], // the symmetric 3×3 eigen-solver on flat arrays
  ["tensor"], // the stress tensor: validation, principal stresses, invariants, rotation, traction
  ["plane", "parse", "batch", "materials", "testing"],
  ["criteria", "frames"],
  ["checks"],
];
const coreZones = [
  ...CORE_LAYERS.flatMap((layer, i) => {
    const below = CORE_LAYERS.slice(0, i).flat();
    return layer.map((folder) => ({
      target: `./core/${folder}`,
      from: "./core",
      except: [folder, ...below].map((f) => `./${f}`),
      message: `core/${folder} may import ${below.length === 0 ? "nothing in core" : below.map((f) => `core/${f}`).join(", ")} (the layers in eslint.config.js).`,
    }));
  }),
  { target: "./core/constants", from: "./node_modules", message: "core/constants imports no package." },
  // The engine never imports the demo data or the wire schemas. core/report is no engine: it turns a
  // record's content (a wire schema) into the report both the PDF and the print page draw.
  {
    target: ["./core/*.ts", "./core/!(demo-data|contract|report)/**"],
    from: ["./core/demo-data", "./core/contract"],
    message: "The engine imports neither core/demo-data (demo data) nor core/contract (wire schemas).",
  },
  // The wire schemas go to the browser: zod and core's dependency-free constants only, never the engine.
  {
    target: "./core/contract",
    from: "./core",
    except: ["./contract", "./constants"],
    message: "core/contract imports only zod and core/constants (it ships to the browser).",
  },
  {
    target: "./core/contract",
    from: "./node_modules",
    except: ["./zod"],
    message: "core/contract imports only zod and core/constants (it ships to the browser).",
  },
];

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
            coreImportsNothingOutside,
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
            // Routes read and write through db/repositories/ (plain rows). Still on the models, to move
            // next: auth (users, verification and reset tokens).
            ...routeFolders
              .filter((folder) => folder !== "auth")
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
            // Server resources many features use live in web/src/entities (fetchers, one key factory,
            // queries, mutations); they build on lib/ and core/ only, never on a page or the app.
            {
              target: "./web/src/entities",
              from: ["./web/src/features", "./web/src/app", "./web/src/components"],
              message: "web/src/entities may use web/src/lib and core/ only (and other entities).",
            },
            // Shared helpers and presentational pieces know no feature, entity or the app.
            {
              target: ["./web/src/lib", "./web/src/components"],
              from: ["./web/src/features", "./web/src/entities", "./web/src/app"],
              message: "web/src/lib and web/src/components serve every feature: they import none of them.",
            },
            // Features do not import each other (they share through web/src/entities, lib and
            // components); web/src/app composes them.
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
      // Replaces the zones above for core's own files: the outside rule again, plus core's layers.
      "import-x/no-restricted-paths": ["error", { zones: [coreImportsNothingOutside, ...coreZones] }],
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
