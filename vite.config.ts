import { defineConfig } from "vitest/config";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { fileURLToPath } from "node:url";

const repoRoot = fileURLToPath(new URL(".", import.meta.url));
const apiPort = process.env.API_PORT ?? "5174";

// Vite's root is web/ (the app); vitest's root is the repository so that tests beside
// core/, api/ and db/ are found too. Two vitest projects: "unit" needs nothing running,
// "integration" gets a throwaway PostgreSQL cluster and a built app from its globalSetup.
export default defineConfig({
  root: "web",
  publicDir: "public",
  plugins: [react(), tailwindcss()],
  build: {
    outDir: "../dist/web",
    emptyOutDir: true,
    chunkSizeWarningLimit: 900,
    // Fonts stay files, never data: URIs, so the Content-Security-Policy can say font-src 'self'.
    assetsInlineLimit: (file) => (/\.woff2?$/.test(file) ? false : undefined),
  },
  server: {
    host: "127.0.0.1",
    port: 5173,
    // scripts/dev.ts tells the API this origin (links in e-mail, the Origin check).
    strictPort: true,
    proxy: { "/api": `http://127.0.0.1:${apiPort}` },
  },
  test: {
    root: repoRoot,
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          root: repoRoot,
          include: ["core/**/*.test.ts", "web/src/**/*.test.{ts,tsx}", "api/**/*.test.ts", "db/**/*.test.ts"],
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          name: "integration",
          root: repoRoot,
          include: ["test/**/*.test.ts"],
          environment: "node",
          globalSetup: ["test/global-setup.ts"],
          testTimeout: 60_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
