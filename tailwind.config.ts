import type { Config } from "tailwindcss";

// Foldwright's look (DESIGN §11): warm paper, ink text, one verdigris accent, amber for
// "needs a look", brick for errors and holds.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#F6F3EC", deep: "#ECE7DB", edge: "#D9D2C3" },
        ink: { DEFAULT: "#1F2430", soft: "#4A5060", faint: "#5E6372" }, // faint: 5.4:1 on paper (WCAG AA 4.5:1)
        verdigris: { DEFAULT: "#2E6B5E", dark: "#22524A", light: "#D7E6E1" },
        amber: { DEFAULT: "#855309", dark: "#7A4C08", light: "#F3E3C6" }, // text: 5.1:1 on amber-light
        brick: { DEFAULT: "#9A3324", light: "#F2D9D4" },
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        serif: ["var(--font-serif)", "Georgia", "serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
    },
  },
};

export default config;
