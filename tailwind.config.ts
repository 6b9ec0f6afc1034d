// Axlewright's own look: a drafting table. Warm paper, ink-blue geometry and text, a faint
// millimetre grid, one safety orange kept for cautions, figures in a monospace face.
// Tailwind v4 reads this file through the `@config` directive in app/globals.css.
import type { Config } from "tailwindcss";

export default {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f6f0e1", deep: "#ece3cc", edge: "#d9ccaa" },
        ink: { DEFAULT: "#1d3557", soft: "#3d5a80", faint: "#8da2bb", line: "#c4cfdc" },
        grid: "#e2d6b8",
        // The orange itself marks borders, fills and dots; words in caution are set in its darker
        // shade, which keeps 4.5:1 on paper, caution-soft and white (WCAG 2.1 SC 1.4.3).
        caution: { DEFAULT: "#e8590c", soft: "#fde6d5", ink: "#a3420a" },
        pass: "#2f6d4f",
      },
      fontFamily: {
        sans: ["var(--font-plex-sans)", "ui-sans-serif", "system-ui", "sans-serif"],
        mono: ["var(--font-plex-mono)", "ui-monospace", "monospace"],
      },
      spacing: { gutter: "1.25rem", rule: "1px" },
      borderRadius: { plate: "3px" },
      boxShadow: { sheet: "0 1px 0 #d9ccaa, 0 2px 6px rgba(29,53,87,0.08)" },
    },
  },
} satisfies Config;
