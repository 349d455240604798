import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTypescript from "eslint-config-next/typescript";

export default defineConfig([
  ...nextVitals,
  ...nextTypescript,
  {
    rules: {
      // An error, not Next's warning: `lint` runs with --max-warnings=0 anyway, and a leading
      // underscore (or a rest sibling) is how the code marks a value it drops on purpose.
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrorsIgnorePattern: "^_", ignoreRestSiblings: true },
      ],
    },
  },
  // Build output, local data and generated files: none of it is written by hand.
  globalIgnores([
    ".next/**",
    ".next-*/**",
    "out/**",
    "build/**",
    "next-env.d.ts",
    "data/**",
    "test-output/**",
    "public/models/**",
    "db/migrations/**",
  ]),
]);
