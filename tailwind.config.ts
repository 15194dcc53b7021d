import type { Config } from "tailwindcss";

// Tailwind v4 reads this file through the `@config` line in app/globals.css.
// The theme (colours, fonts) lives here so every screen shares it.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./src/**/*.{ts,tsx}"],
  theme: {
    extend: {
      fontFamily: {
        sans: ["var(--font-inter)", "system-ui", "sans-serif"],
      },
      colors: {
        // Our own palette: deep teal ink for structure, amber for warnings,
        // a brick red for errors, slate for info.
        ink: { DEFAULT: "#12343b", soft: "#2d545e", faint: "#e1ebe9" },
        lane: { rf: "#2b6f77", optical: "#7a4fa0", if: "#b5651d" },
        sev: { error: "#b3261e", warning: "#a15c00", info: "#3f5a73", ok: "#2e7d32" },
      },
    },
  },
};

export default config;
