/**
 * The state-changing routes of the app, read from the route files under
 * app/api (every `export const POST|PUT|PATCH|DELETE` or exported function
 * of that name), so a test over "every mutation route" covers a route the
 * day it is added.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative, sep } from "node:path";

export type Method = "POST" | "PUT" | "PATCH" | "DELETE";
export interface MutationRoute {
  method: Method;
  /** The path pattern, e.g. `/api/v1/missions/[missionId]/lasers/[id]`. */
  pattern: string;
}

const ROOT = join(__dirname, "../..");

function routeFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) return routeFiles(p);
    return name === "route.ts" ? [p] : [];
  });
}

export function mutationRoutes(): MutationRoute[] {
  const out: MutationRoute[] = [];
  for (const file of routeFiles(join(ROOT, "app/api"))) {
    const text = readFileSync(file, "utf8");
    const pattern = "/" + relative(join(ROOT, "app"), file).split(sep).slice(0, -1).join("/");
    for (const m of text.matchAll(/export\s+(?:const|async\s+function|function)\s+(POST|PUT|PATCH|DELETE)\b/g))
      out.push({ method: m[1] as Method, pattern });
  }
  return out.sort((a, b) => (a.pattern + a.method).localeCompare(b.pattern + b.method));
}

/** The path of a pattern with its dynamic segments filled in (`[...all]` by `all`). */
export function fillPattern(pattern: string, values: Record<string, string>): string {
  return pattern.replace(/\[(?:\.\.\.)?([A-Za-z]+)\]/g, (_m, name: string) => {
    const v = values[name];
    if (v === undefined) throw new Error(`no value for [${name}] in ${pattern}`);
    return v;
  });
}
