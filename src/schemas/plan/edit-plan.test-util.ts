import { expect } from "vitest";
import { parsePlan, type PlanIssue } from "../plan";
import { validPlanInput } from "../../../tests/fixtures/valid-plan";

/** Helpers of the plan schema's tests: edit the valid base plan, parse it, and expect its issues. */

// The document is edited through loosely typed records so tests can write
// values of the wrong type on purpose.
export type Doc = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

export function check(edit: (doc: Doc) => void) {
  const doc = validPlanInput() as Doc;
  edit(doc);
  return parsePlan(doc);
}
export function issues(edit: (doc: Doc) => void): PlanIssue[] {
  const r = check(edit);
  return r.ok ? [] : r.issues;
}
export function expectValid(edit: (doc: Doc) => void) {
  const r = check(edit);
  expect(r.ok ? [] : r.issues).toEqual([]);
  expect(r.ok).toBe(true);
}
export function expectOnly(edit: (doc: Doc) => void, path: string, message: string | RegExp) {
  const found = issues(edit);
  expect(found).toHaveLength(1);
  expect(found[0]!.path).toBe(path);
  if (typeof message === "string") expect(found[0]!.message).toBe(message);
  else expect(found[0]!.message).toMatch(message);
}

/** Sets a value at a dotted path with numeric indices: "lasers.0.lock.orders". */
export function setAt(doc: Doc, path: string, value: unknown) {
  const keys = path.split(".");
  let o: Doc = doc;
  for (const k of keys.slice(0, -1)) o = o[k];
  o[keys[keys.length - 1]!] = value;
}
export function deleteAt(doc: Doc, path: string) {
  const keys = path.split(".");
  let o: Doc = doc;
  for (const k of keys.slice(0, -1)) o = o[k];
  delete o[keys[keys.length - 1]!];
}
/** "lasers.0.lock.orders" → "lasers[0].lock.orders" */
export const jsonPath = (dotted: string) => dotted.replace(/\.(\d+)/g, "[$1]");
