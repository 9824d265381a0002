import nextVitals from "eslint-config-next/core-web-vitals";
import nextTypescript from "eslint-config-next/typescript";

/**
 * The layers, as DEVELOPERS.md's architecture table states them. Each entry forbids imports by
 * pattern; `allowTypeImports` lets a layer name a type from below without pulling in its code.
 */
const pureCore = { regex: "^[^.]", message: "lib/tire/ is the pure core: it imports nothing but its own files (no packages, no node:, no @/)." };
const leavesCore = "lib/tire/ imports nothing outside itself.";

// Globs never overlap: for one file, the last matching entry's rule would win rather than add up.
const layers = [
  { files: ["lib/tire/*.ts"], patterns: [pureCore, { regex: "^\\.\\./", message: leavesCore }] },
  { files: ["lib/tire/*/*.ts"], patterns: [pureCore, { regex: "^\\.\\./\\.\\./", message: leavesCore }] },
  {
    files: ["lib/**/*.ts", "lib/**/*.tsx"],
    ignores: ["lib/tire/**"],
    patterns: [{ regex: "^@/(components|app)(/|$)", message: "lib/ never calls back up into components/ or app/." }],
  },
  {
    files: ["db/**/*.ts"],
    patterns: [
      { regex: "^@/(?!db(/|$)|lib/tire(/|$))", message: "db/ imports nothing from the app but the pure lib/tire/: pass settings in as arguments." },
      { regex: "^(\\.\\./)+(?!lib/tire/)(lib|components|app|content)/", message: "db/ imports nothing from the app but the pure lib/tire/." },
    ],
  },
  {
    files: ["content/**/*.ts"],
    patterns: [{ regex: "^@/(?!lib/tire(/|$)|content(/|$))", message: "content/ holds words: it may use the tire core's figures, nothing else." }],
  },
  {
    files: ["components/**/*.ts", "components/**/*.tsx"],
    patterns: [
      { regex: "^@/db(/|$)", allowTypeImports: true, message: "Components may name a database type, never import its code (client bundles would carry it)." },
      { regex: "^@/lib/database(/|$)", message: "Components never query the database: the page or route handler fetches through lib/ and passes props." },
      { regex: "^@/app(/|$)", message: "Components never import routes." },
    ],
  },
];

const config = [
  ...nextVitals,
  ...nextTypescript,
  ...layers.map(({ files, ignores = [], patterns }) => ({ files, ignores, rules: { "@typescript-eslint/no-restricted-imports": ["error", { patterns }] } })),
  {
    ignores: [".next/**", ".data/**", "node_modules/**", "db/migrations/**", "test-results/**", "playwright-report/**", "next-env.d.ts"],
  },
];

export default config;
