import { ESLint } from "eslint";
import { describe, expect, it } from "vitest";
import { join } from "node:path";

// The layering of docs/decisions/001-layout.md is enforced by lint (ADR 019).
// Each case lints a deliberate back-edge at a path inside the layer and
// expects the import to be refused; the control cases prove that the same
// text is accepted where the layering allows it, so the rule cannot pass by
// refusing everything.
const eslint = new ESLint({ cwd: join(__dirname, "../..") });

async function restrictedImports(filePath: string, text: string): Promise<string[]> {
  const [result] = await eslint.lintText(text, { filePath });
  return (result?.messages ?? [])
    .filter((m) => m.ruleId === "no-restricted-imports" || m.ruleId === "@typescript-eslint/no-restricted-imports")
    .map((m) => m.message);
}

const backEdges: [string, string, string][] = [
  [
    "src/lib imports React",
    "src/lib/plan/back-edge.ts",
    'import { useState } from "react";\nexport const x = useState;\n',
  ],
  [
    "src/lib imports Next",
    "src/lib/optics/back-edge.ts",
    'import { headers } from "next/headers";\nexport const x = headers;\n',
  ],
  [
    "src/lib imports the database",
    "src/lib/plan/back-edge.ts",
    'import { db } from "@db/client";\nexport const x = db;\n',
  ],
  [
    "src/lib imports server code",
    "src/lib/lanes/back-edge.ts",
    'import { auth } from "@/server/auth/auth";\nexport const x = auth;\n',
  ],
  [
    "src/lib uses Node I/O",
    "src/lib/imports/back-edge.ts",
    'import { readFileSync } from "node:fs";\nexport const x = readFileSync;\n',
  ],
  [
    "src/lib reaches another domain's internals",
    "src/lib/lanes/back-edge.ts",
    'import { chainContext } from "@/lib/plan/internals/chain-context";\nexport const x = chainContext;\n',
  ],
  [
    "app imports the database",
    "app/(app)/back-edge/page.tsx",
    'import { db } from "@db/client";\nexport const x = db;\n',
  ],
  [
    "app imports a test fixture",
    "app/(app)/back-edge/page.tsx",
    'import plan from "../../../tests/fixtures/plans/ex1-single-channel.plan.json";\nexport const x = plan;\n',
  ],
  [
    "db imports server code",
    "db/seed/back-edge.ts",
    'import { auth } from "@/server/auth/auth";\nexport const x = auth;\n',
  ],
  [
    "a component imports server code as a value",
    "src/components/back-edge.tsx",
    'import { listMissions } from "@/server/workspace/queries";\nexport const x = listMissions;\n',
  ],
  [
    "a component imports the database",
    "src/queries/back-edge.ts",
    'import { db } from "@db/client";\nexport const x = db;\n',
  ],
  [
    "the bench reaches into engine internals",
    "src/bench/back-edge.ts",
    'import { mapPieces } from "@/lib/plan/internals/map-sweep";\nexport const x = mapPieces;\n',
  ],
  [
    "a schema imports React",
    "src/schemas/back-edge.ts",
    'import { useState } from "react";\nexport const x = useState;\n',
  ],
];

const allowed: [string, string, string][] = [
  [
    "src/lib imports its own internals",
    "src/lib/plan/allowed.ts",
    'import { TOL } from "./internals/tolerance";\nexport const x = TOL;\n',
  ],
  [
    "src/lib imports another domain's public index",
    "src/lib/lanes/allowed.ts",
    'import { checkPlan } from "@/lib/plan";\nexport const x = checkPlan;\n',
  ],
  [
    "server code imports the database",
    "src/server/allowed.ts",
    'import { db } from "@db/client";\nexport const x = db;\n',
  ],
  [
    "a component imports a server module's types only",
    "src/components/allowed.tsx",
    'import type { Actor } from "@/server/auth/actor";\nexport type X = Actor;\n',
  ],
  [
    "a page imports server code",
    "app/(app)/allowed/page.tsx",
    'import { auth } from "@/server/auth/auth";\nexport const x = auth;\n',
  ],
];

describe("lint enforces the layers", { timeout: 60_000 }, () => {
  it.each(backEdges)("%s: refused", async (_label, path, text) => {
    expect(await restrictedImports(path, text)).not.toEqual([]);
  });
  it.each(allowed)("%s: accepted", async (_label, path, text) => {
    expect(await restrictedImports(path, text)).toEqual([]);
  });
});
