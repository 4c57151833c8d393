import type { Config } from "tailwindcss";

// Loopwright palette: warm copper accent on light paper; flow red and return blue
// follow trade convention for pipe colours.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#faf7f2", dark: "#f1ece3" },
        ink: { DEFAULT: "#1f1d1a", soft: "#4a453e", faint: "#8a8378" },
        copper: { 50: "#fbf1ea", 100: "#f4dcc9", 300: "#dc9a6a", 500: "#b4632b", 600: "#9a5222", 700: "#7c411b" },
        flow: { DEFAULT: "#c8322b", light: "#f6d5d2" },
        return: { DEFAULT: "#2b5fc8", light: "#d3def6" },
        ok: "#2f7d4f",
        warn: "#b7791f",
        fault: "#b42318",
      },
      fontFamily: {
        sans: ["var(--font-plex-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-plex-mono)", "ui-monospace", "monospace"],
      },
    },
  },
};

export default config;
