// A small lint config: the recommended rules for JS and TS, and React's hook rules.
import js from "@eslint/js";
import globals from "globals";
import reactHooks from "eslint-plugin-react-hooks";
import tseslint from "typescript-eslint";

export default tseslint.config(
  { ignores: ["build/", ".react-router/", ".data/", "node_modules/"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  // The layers: app/lib is plain TypeScript; components get data from routes; routes get plain data
  // from services; a migration is frozen and imports no live constants.
  {
    files: ["app/lib/**"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              group: [
                "react",
                "react-dom",
                "react-router",
                "@react-router/*",
                "sequelize",
                "~/services/*",
                "~/components/*",
                "~/routes/*",
                "**/db/**",
                "../services/*",
              ],
              message: "app/lib imports no React, React Router, Sequelize, services or db.",
            },
          ],
        },
      ],
    },
  },
  {
    files: ["app/components/**"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [{ group: ["~/services/*", "**/*.server", "**/db/**", "sequelize"], message: "Components import no services or database code." }] },
      ],
    },
  },
  {
    files: ["app/routes/**"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [{ group: ["~/services/db.server", "**/db/**", "sequelize"], message: "Routes get plain data from services, not models." }] },
      ],
    },
  },
  {
    files: ["db/migrations/**"],
    rules: {
      "no-restricted-imports": ["error", { patterns: [{ group: ["**/app/**", "~/*"], message: "A migration never imports live constants from the app." }] }],
    },
  },
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
