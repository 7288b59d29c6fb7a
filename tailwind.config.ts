import type { Config } from "tailwindcss";

/** Loaded by app/globals.css through `@config` (Tailwind v4). */
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      fontFamily: {
        mono: ["JetBrains Mono", "ui-monospace", "monospace"],
      },
      colors: {
        kraft: { 50: "#faf6ef", 100: "#f1e8d6", 200: "#e2cfa8", 500: "#b08947", 700: "#6f5226", 900: "#3a2a12" },
        foam: { 400: "#3fb6a8", 600: "#1f7f74", 800: "#11463f" },
        ember: { 500: "#e0602a", 700: "#a23c12" },
      },
    },
  },
};

export default config;
