import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

const alias = {
  "@/": fileURLToPath(new URL("./src/", import.meta.url)),
  "@db/": fileURLToPath(new URL("./db/", import.meta.url)),
  // `server-only` throws outside a React Server Component bundle; the tests
  // import server modules directly, so it is replaced by an empty module.
  "server-only": fileURLToPath(new URL("./tests/setup/empty.ts", import.meta.url)),
};

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: "unit",
          setupFiles: ["tests/setup/fast-check-seed.ts"],
          include: ["src/**/*.test.ts", "src/**/*.test.tsx", "tests/reference/**/*.test.ts", "tests/lint/**/*.test.ts"],
          environment: "node",
        },
      },
      {
        resolve: { alias },
        test: {
          name: "integration",
          setupFiles: ["tests/setup/fast-check-seed.ts"],
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "e2e",
          setupFiles: ["tests/setup/fast-check-seed.ts"],
          include: ["tests/e2e/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 90_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
