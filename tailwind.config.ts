import type { Config } from "tailwindcss";

// Shop palette: spruce (primary actions), maple (surfaces), graphite (text), brass (highlights).
// Red is reserved for errors. Pairs used for text were checked for WCAG AA contrast (≥ 4.5:1).
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        spruce: { 50: "#eef5f1", 100: "#d5e8dd", 600: "#2f6b4f", 700: "#245840", 800: "#1b4331", 900: "#133024" },
        maple: { 50: "#fdfaf3", 100: "#f8f1e2", 200: "#efe3c8", 300: "#e2cfa6" },
        graphite: { 400: "#8a8f94", 500: "#6b7075", 600: "#50555a", 700: "#3a3e42", 900: "#1f2225" },
        brass: { 300: "#e3c372", 400: "#d2a942", 500: "#b08a2a", 700: "#7a5e17" },
        alarm: { 50: "#fdf0ef", 600: "#b42318", 700: "#912018" },
      },
      fontFamily: { sans: ["var(--font-inter)", "system-ui", "sans-serif"] },
    },
  },
};

export default config;
