import type { Config } from "tailwindcss";

/**
 * Sigmacube's palette and type, each defined once as a named token.
 * Tension/compression are a colour-blind-safe warm/cool pair; verdict colours never
 * appear without their word and mark (see web/src/components/Verdict.tsx).
 */
export default {
  content: ["./web/index.html", "./web/src/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f5f1e8", deep: "#ebe5d7" },
        panel: "#fcfcfa",
        rule: { DEFAULT: "#d8d1c1", strong: "#b9b09c" },
        graphite: { DEFAULT: "#2a2c30", soft: "#5b5e66", faint: "#676970" },
        ink: { DEFAULT: "#1d5a55", hover: "#154743", wash: "#e3eeec" },
        tension: { DEFAULT: "#c4561d", wash: "#f7e3d6" },
        compression: { DEFAULT: "#2767a8", wash: "#dde8f4" },
        pass: { DEFAULT: "#2f7446", wash: "#e1efe4" },
        // #85560c on its wash is 5.3:1 (WCAG AA asks 4.5:1 for small text; the earlier #9a6410 gave 4.2:1).
        close: { DEFAULT: "#85560c", wash: "#f6ead2" },
        fail: { DEFAULT: "#b02a22", wash: "#f6dedb" },
      },
      fontFamily: {
        sans: ['"Source Sans 3 Variable"', "system-ui", "sans-serif"],
        mono: ['"JetBrains Mono"', "ui-monospace", "monospace"],
      },
      backgroundImage: {
        grid: "linear-gradient(to right, rgb(29 90 85 / 0.06) 1px, transparent 1px), linear-gradient(to bottom, rgb(29 90 85 / 0.06) 1px, transparent 1px)",
      },
      backgroundSize: { grid: "16px 16px" },
    },
  },
} satisfies Config;
