// A small lint config: the recommended rules for JS and TS, and React's hook rules.
import js from "@eslint/js";
import globals from "globals";
import reactHooks from "eslint-plugin-react-hooks";
import tseslint from "typescript-eslint";

export default tseslint.config(
  { ignores: ["build/", ".react-router/", ".data/", "node_modules/", "public/sw.js"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  // Plain JavaScript run by Node (the production server).
  { files: ["**/*.js"], languageOptions: { globals: globals.node } },
  {
    plugins: { "react-hooks": reactHooks },
    rules: {
      "react-hooks/rules-of-hooks": "error",
      "react-hooks/exhaustive-deps": "warn",
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
);
