// ESLint 9 flat config, run by `npm run lint` and by scripts/test.sh before the suites.
// Rules are chosen for signal: each one below flags code that is wrong or fragile, not a matter of taste.
import js from "@eslint/js";
import nextPlugin from "@next/eslint-plugin-next";
import reactHooks from "eslint-plugin-react-hooks";
import tseslint from "typescript-eslint";

export default tseslint.config(
  {
    // Generated, vendored or produced by a run: not ours to lint.
    ignores: [
      "**/node_modules/**",
      ".next*/**",
      ".data/**",
      "drizzle/**",
      "test-results/**",
      "playwright-report/**",
      "public/**",
      "next-env.d.ts",
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ["**/*.{ts,tsx,mts,cts}"],
    rules: {
      // TypeScript already reports undefined names, with types and globals known; the core rule only misfires.
      "no-undef": "off",
      // Matching control characters is exactly what the input and CSV guards mean to do.
      "no-control-regex": "off",
      // `_name` marks a parameter a signature needs but the body does not use.
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrors: "none", ignoreRestSiblings: true },
      ],
    },
  },
  {
    files: ["**/*.{js,mjs,cjs}"],
    languageOptions: {
      globals: {
        process: "readonly", console: "readonly", URL: "readonly", Buffer: "readonly",
        setTimeout: "readonly", clearTimeout: "readonly", fetch: "readonly", structuredClone: "readonly",
      },
    },
  },
  {
    files: ["app/**/*.{ts,tsx}", "components/**/*.{ts,tsx}", "lib/**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks },
    rules: {
      "react-hooks/rules-of-hooks": "error",
      "react-hooks/exhaustive-deps": "error", // the tree passes it: keep it that way
    },
  },
  {
    files: ["app/**/*.{ts,tsx}", "components/**/*.{ts,tsx}"],
    ...nextPlugin.configs.recommended,
    rules: { ...nextPlugin.configs.recommended.rules, ...nextPlugin.configs["core-web-vitals"].rules },
  },
);
