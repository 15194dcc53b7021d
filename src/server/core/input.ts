import "server-only";
import type { z } from "zod";
import { zodIssues } from "@/schemas/issues";
import { invalidInput } from "./http";

/** Parses with a zod schema or throws a 400 `invalid-input` naming every rejected field. */
export function parseOr400<S extends z.ZodType>(schema: S, value: unknown, what = "request"): z.output<S> {
  const r = schema.safeParse(value);
  if (!r.success) throw invalidInput(zodIssues(r.error), `The ${what} is not valid.`);
  return r.data;
}

/** A UUID in its text form (row ids of missions, entities, findings, waivers). */
export const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export const isUuid = (s: string) => UUID.test(s);
