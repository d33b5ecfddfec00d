import type { Config } from "tailwindcss";

/**
 * Satura's design tokens. Colours are CSS variables (set in src/styles/app.css) so the
 * default warm-paper theme and Sunlight mode swap them without touching components.
 * Low side and high side get their own hues, but every state also carries a word and
 * an icon: colour is never the only signal.
 */
export default {
  content: ["./index.html", "./src/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: "var(--color-paper)",
        surface: "var(--color-surface)",
        sunken: "var(--color-sunken)",
        ink: "var(--color-ink)",
        muted: "var(--color-muted)",
        rule: "var(--color-rule)",
        accent: { DEFAULT: "var(--color-accent)", ink: "var(--color-accent-ink)" },
        low: "var(--color-low)",
        high: "var(--color-high)",
        good: "var(--color-good)",
        caution: "var(--color-caution)",
        fault: "var(--color-fault)",
        focus: "var(--color-focus)",
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', "system-ui", "sans-serif"],
        mono: ['"IBM Plex Mono"', "ui-monospace", "monospace"],
      },
      spacing: {
        touch: "2.75rem", // 44 px: the smallest target a gloved finger can hit reliably
      },
      minHeight: { touch: "2.75rem" },
      minWidth: { touch: "2.75rem" },
      borderRadius: { card: "0.625rem" },
      boxShadow: { card: "0 1px 0 var(--color-rule), 0 1px 3px rgb(0 0 0 / 0.06)" },
    },
  },
} satisfies Config;
