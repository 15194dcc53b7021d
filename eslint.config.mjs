import next from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

// The layers of docs/decisions/001-layout.md as lint rules (ADR 019): every
// edge that runs back up the stack fails `eslint`. tests/lint/layers.test.ts
// proves each rule fires on a deliberate back-edge.
const NODE_IO = [
  "node:*",
  "fs",
  "fs/*",
  "path",
  "child_process",
  "net",
  "http",
  "https",
  "os",
  "worker_threads",
  "stream",
];
const REACT_NEXT = ["react", "react/*", "react-dom", "react-dom/*", "next", "next/*", "server-only"];
const DB = ["@db/*", "**/db/*", "**/db"];
const SERVER = ["@/server/*", "**/server/*"];
const FOREIGN_INTERNALS = [
  "@/lib/*/internals",
  "@/lib/*/internals/*",
  "../*/internals",
  "../*/internals/*",
  "../../*/internals/*",
];

const TESTS = ["**/tests/*", "**/tests/**"];

const restrict = (groups, message) => ({ group: groups, message });

const config = [
  ...next,
  ...nextTs,
  {
    ignores: [".next/**", ".next-*/**", "node_modules/**", ".data/**", "test-output/**", "drizzle/**", "next-env.d.ts"],
  },
  {
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  {
    // The pure engine: no React, Next, database, server code or Node I/O, and
    // no other domain's internals. Tests beside the code may read fixture files.
    files: ["src/lib/**/*.ts", "src/lib/**/*.tsx"],
    ignores: ["src/lib/**/*.test.ts", "src/lib/**/*.test.tsx", "src/lib/**/*.test-util.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            restrict(REACT_NEXT, "src/lib is pure: no React or Next (ADR 001)."),
            restrict(DB, "src/lib is pure: no database (ADR 001)."),
            restrict(SERVER, "src/lib is pure: no server code (ADR 001)."),
            restrict(NODE_IO, "src/lib is pure: no Node I/O (ADR 001)."),
            restrict(FOREIGN_INTERNALS, "Use the domain's public index.ts, not another domain's internals (ADR 019)."),
          ],
        },
      ],
    },
  },
  {
    // Schemas are shared by the client, the server and the CLI.
    files: ["src/schemas/**/*.ts"],
    ignores: ["src/schemas/**/*.test.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            restrict(REACT_NEXT, "src/schemas holds zod schemas only (ADR 001)."),
            restrict(DB, "src/schemas holds zod schemas only (ADR 001)."),
            restrict(SERVER, "src/schemas holds zod schemas only (ADR 001)."),
            restrict(NODE_IO, "src/schemas holds zod schemas only (ADR 001)."),
          ],
        },
      ],
    },
  },
  {
    // Client UI: no database; server modules only as types (erased at build).
    files: ["src/components/**/*.ts", "src/components/**/*.tsx", "src/queries/**/*.ts"],
    ignores: ["**/*.test.ts", "**/*.test.tsx"],
    rules: {
      "@typescript-eslint/no-restricted-imports": [
        "error",
        {
          patterns: [
            { group: DB, message: "Client code never touches the database (ADR 001)." },
            {
              group: SERVER,
              message: "Client code may import server modules as types only (ADR 019).",
              allowTypeImports: true,
            },
            { group: FOREIGN_INTERNALS, message: "Use the domain's public index.ts, not its internals (ADR 019)." },
          ],
        },
      ],
    },
  },
  {
    // Routes call src/*, never the database directly.
    files: ["app/**/*.ts", "app/**/*.tsx", "proxy.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            restrict(
              DB,
              "app/ holds routes only and never imports db/ (ADR 001); call a query or service in src/server.",
            ),
            restrict(TESTS, "Production code never imports test fixtures (ADR 019)."),
            restrict(FOREIGN_INTERNALS, "Use the domain's public index.ts, not its internals (ADR 019)."),
          ],
        },
      ],
    },
  },
  {
    // Command line, benchmarks and server: engine code through public index.ts files, never test fixtures.
    files: ["src/bench/**/*.ts", "src/cli/**/*.ts", "src/server/**/*.ts"],
    ignores: ["**/*.test.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            restrict(FOREIGN_INTERNALS, "Use the domain's public index.ts, not its internals (ADR 019)."),
            restrict(TESTS, "Production code never imports test fixtures (ADR 019)."),
          ],
        },
      ],
    },
  },
  {
    // The database layer sits below the server.
    files: ["db/**/*.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [restrict(SERVER, "db/ sits below src/server and never imports it (ADR 019).")] },
      ],
    },
  },
];

export default config;
