/**
 * The import rules of the server core refactor, checked on the source
 * files: which folder may import which, no import cycle in src/server, and
 * every route handler and server action behind the core's guards.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { describe, expect, it } from "vitest";

const ROOT = resolve(__dirname, "../../..");

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? walk(p) : /\.(ts|tsx)$/.test(name) ? [p] : [];
  });
}

const rel = (p: string) => relative(ROOT, p).split("\\").join("/");

/** Import specifiers of a file: static, side-effect, re-export and dynamic imports. */
function specifiers(file: string): string[] {
  const text = readFileSync(file, "utf8");
  const out: string[] = [];
  for (const m of text.matchAll(/(?:^|\n)\s*(?:import|export)\s[^;]*?from\s+"([^"]+)"/g)) out.push(m[1]!);
  for (const m of text.matchAll(/(?:^|\n)\s*import\s+"([^"]+)"/g)) out.push(m[1]!);
  for (const m of text.matchAll(/import\(\s*"([^"]+)"\s*\)/g)) out.push(m[1]!);
  return out;
}

/** The project file a specifier names (without extension resolution details), or null for a package. */
function target(from: string, spec: string): string | null {
  let base: string;
  if (spec.startsWith("@/")) base = join(ROOT, "src", spec.slice(2));
  else if (spec.startsWith("@db/")) base = join(ROOT, "db", spec.slice(4));
  else if (spec.startsWith(".")) base = resolve(dirname(from), spec);
  else return null;
  for (const candidate of [base, `${base}.ts`, `${base}.tsx`, join(base, "index.ts")]) {
    try {
      if (statSync(candidate).isFile()) return rel(candidate);
    } catch {
      // not this one
    }
  }
  return rel(base);
}

const sources = [...walk(join(ROOT, "src")), ...walk(join(ROOT, "db")), ...walk(join(ROOT, "app"))].filter(
  (f) => !/\.test\.tsx?$/.test(f),
);
const graph = new Map(
  sources.map((f) => [rel(f), specifiers(f).flatMap((s) => (target(f, s) ? [target(f, s)!] : []))]),
);
const importsOf = (prefix: string) =>
  [...graph].filter(([f]) => f.startsWith(prefix)).flatMap(([f, ts]) => ts.map((t) => [f, t] as const));

describe("layering", () => {
  it("db/ imports nothing from src/server", () => {
    expect(importsOf("db/").filter(([, t]) => t.startsWith("src/server/"))).toEqual([]);
  });

  it("review imports nothing of the workspace; the workspace imports only review's plan-events module", () => {
    expect(importsOf("src/server/review/").filter(([, t]) => t.startsWith("src/server/workspace/"))).toEqual([]);
    expect(
      importsOf("src/server/workspace/").filter(
        ([, t]) => t.startsWith("src/server/review/") && t !== "src/server/review/plan-events.ts",
      ),
    ).toEqual([]);
  });

  it("the core imports no area built on it", () => {
    const areas = ["src/server/workspace/", "src/server/review/", "src/server/team/", "src/server/seed/"];
    expect(importsOf("src/server/core/").filter(([, t]) => areas.some((a) => t.startsWith(a)))).toEqual([]);
  });

  it("server modules import the core's modules, never its index (which loads the guards and the auth instance)", () => {
    expect(importsOf("src/server/").filter(([, t]) => t === "src/server/core/index.ts")).toEqual([]);
  });

  it("app/ imports neither db/ nor tests/", () => {
    expect(importsOf("app/").filter(([, t]) => t.startsWith("db/") || t.startsWith("tests/"))).toEqual([]);
  });

  it("src/server has no import cycle", () => {
    const server = [...graph.keys()].filter((f) => f.startsWith("src/server/"));
    const state = new Map<string, "open" | "done">();
    const cycles: string[][] = [];
    const visit = (f: string, path: string[]) => {
      if (state.get(f) === "done") return;
      if (state.get(f) === "open") {
        cycles.push([...path.slice(path.indexOf(f)), f]);
        return;
      }
      state.set(f, "open");
      for (const t of graph.get(f) ?? []) if (t.startsWith("src/server/")) visit(t, [...path, f]);
      state.set(f, "done");
    };
    for (const f of server) visit(f, []);
    expect(cycles).toEqual([]);
  });
});

describe("guards", () => {
  const METHODS = /export\s+(?:const|async function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b\s*=?\s*([^\n;]*)/g;
  const routes = [...graph.keys()].filter((f) => f.startsWith("app/api/") && f.endsWith("/route.ts"));
  // better-auth's own handler and the load balancer's probe answer without the guard, and so do the
  // format's JSON Schemas: public documentation, no team's data (ADR 022).
  const UNGUARDED = [
    "app/api/auth/[...all]/route.ts",
    "app/api/health/route.ts",
    "app/api/v1/schema/plan/route.ts",
    "app/api/v1/schema/result/route.ts",
  ];

  it("every route handler but the allowed ones goes through guarded()", () => {
    const notGuarded: string[] = [];
    let guardedHandlers = 0;
    for (const f of routes) {
      if (UNGUARDED.includes(f)) continue;
      const text = readFileSync(join(ROOT, f), "utf8");
      const viaFactory = /const routes = (collectionRoutes|itemRoutes)\(/.test(text);
      for (const m of text.matchAll(METHODS)) {
        const rhs = m[2] ?? "";
        if (rhs.startsWith("guarded(") || (viaFactory && rhs.startsWith(`routes.${m[1]}`))) guardedHandlers++;
        else notGuarded.push(`${f} ${m[1]}`);
      }
      // Errors are answered by the guard, never by a handler of its own.
      expect(text, f).not.toMatch(/errorResponse/);
    }
    expect(notGuarded).toEqual([]);
    expect(guardedHandlers).toBeGreaterThanOrEqual(routes.length - UNGUARDED.length);
  });

  it("every server action goes through formAction, stateAction or plainAction", () => {
    const actions = [...graph.keys()].filter((f) => f.startsWith("app/") && f.endsWith("/actions.ts"));
    expect(actions.length).toBeGreaterThan(0);
    const bad: string[] = [];
    for (const f of actions) {
      const text = readFileSync(join(ROOT, f), "utf8");
      if (/export\s+(async\s+)?function\s/.test(text)) bad.push(`${f}: a function exported without a guard`);
      for (const m of text.matchAll(/export const (\w+) = (\w+)\(/g))
        if (!["formAction", "stateAction", "plainAction"].includes(m[2]!)) bad.push(`${f}: ${m[1]}`);
    }
    expect(bad).toEqual([]);
  });
});
