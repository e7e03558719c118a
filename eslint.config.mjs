// ESLint flat config: Next's own rules (core web vitals, TypeScript, React hooks) plus the full
// recommended accessibility set from jsx-a11y (Next turns on only a few of its rules).
import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";
import jsxA11y from "eslint-plugin-jsx-a11y";

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  // Next's config already registers the jsx-a11y plugin; only its recommended rules are added here.
  { files: ["**/*.{jsx,tsx}"], rules: jsxA11y.flatConfigs.recommended.rules },
  {
    rules: {
      // Apostrophes fill our sentences ("don't", "can't") and render fine; only the characters
      // that usually mean a typo in JSX are refused.
      "react/no-unescaped-entities": ["error", { forbid: [">", "}"] }],
      "@typescript-eslint/no-unused-vars": ["warn", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", destructuredArrayIgnorePattern: "^_" }],
    },
  },
  {
    // Tests read answers of any shape from the running app.
    files: ["tests/**"],
    rules: { "@typescript-eslint/no-explicit-any": "off" },
  },
  globalIgnores([".next/**", ".next-*/**", ".data/**", "node_modules/**", "next-env.d.ts", "db/migrations/**", "test-results/**", "playwright-report/**", "backups/**", "public/sw.js"]),
]);
