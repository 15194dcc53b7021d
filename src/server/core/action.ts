import "server-only";
import { parseWithZod, type SubmissionResult } from "@conform-to/zod/v4";
import { headers as nextHeaders } from "next/headers";
import { redirect } from "next/navigation";
import type { z } from "zod";
import { zodIssues } from "@/schemas/issues";
import type { Actor } from "@/server/auth/actor";
import type { Session } from "@/server/auth/auth";
import { assertActor, readActor } from "@/server/auth/guard";
import { ANY_MEMBER, checkOrigin, type Access } from "./guard";
import { HttpError, invalidInput, unauthorized, unavailable } from "./http";
import { isDatabaseUnreachable } from "./unavailable";

/** A database outage becomes the form's refusal ("cannot be reached … try again"), like the routes' 503. */
const asRefusal = (err: unknown): unknown => (isDatabaseUnreachable(err) ? unavailable() : err);

/**
 * The guard of every server action under app/**\/actions.ts, the sibling of
 * the route guard `guarded`: it checks who may act (before anything else),
 * parses the submitted form with the action's zod schema, runs the handler
 * and turns refusals (`HttpError`) into what the form shows. Next's
 * redirect() and notFound() pass through. Three shapes, by what the form
 * expects back:
 *
 * - `formAction`: conform forms; returns `submission.reply()` (field errors
 *   beside the fields, the input kept);
 * - `stateAction`: small buttons with `useActionState`; returns `{ error }`
 *   or `{ ok }`;
 * - `plainAction`: `<form action>` without state; refusals go to `refused`.
 */

/** `public`: anyone (the sign-in forms); `signed-in`: a session, with or without a team; otherwise as for routes. */
export type ActionAccess = "public" | "signed-in" | Access;

type Who<A extends ActionAccess> = A extends "public"
  ? { session: null; actor: null }
  : A extends "signed-in"
    ? { session: Session; actor: Actor | null }
    : { session: Session; actor: Actor };

export interface ActionSpec<A extends ActionAccess, S extends z.ZodType> {
  access: A;
  /** Completes "Your role in this team does not allow you to …". */
  what?: string;
  schema: S;
  /** When set, a signed-out caller is sent to /sign-in and comes back here afterwards. */
  signInNext?: string;
}

export type ActionContext<A extends ActionAccess, S extends z.ZodType> = Who<A> & {
  headers: Headers;
  value: z.output<S>;
  formData: FormData;
};

/**
 * Who is acting, after the cross-site check: a server action is always a
 * POST, and proxy.ts already answers a cross-site one with 403 before Next
 * runs it; the check is repeated here so an action is safe on its own.
 */
async function who<A extends ActionAccess>(spec: ActionSpec<A, z.ZodType>, h: Headers): Promise<Who<A>> {
  checkOrigin("POST", h);
  if (spec.access === "public") return { session: null, actor: null } as Who<A>;
  const read = await readActor(h);
  if (!read.session && spec.signInNext) redirect(`/sign-in?next=${encodeURIComponent(spec.signInNext)}`);
  if (spec.access === "signed-in") {
    if (!read.session) throw unauthorized();
    return read as Who<A>;
  }
  const permission = spec.access === ANY_MEMBER ? undefined : (spec.access as Exclude<Access, typeof ANY_MEMBER>);
  const actor = assertActor(read, permission, spec.what);
  return { session: read.session, actor } as Who<A>;
}

/** The text fields of a form (files are left out). */
function fieldsOf(formData: FormData): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of formData) if (typeof v === "string") out[k] = v;
  return out;
}

function parseFields<S extends z.ZodType>(schema: S, formData: FormData): z.output<S> {
  const r = schema.safeParse(fieldsOf(formData));
  if (!r.success) throw invalidInput(zodIssues(r.error));
  return r.data;
}

/** What a conform form's handler may answer with: its own field or form errors, or success. */
export type Reply = (options?: {
  formErrors?: string[];
  fieldErrors?: Record<string, string[]>;
  resetForm?: boolean;
}) => SubmissionResult<string[]>;

export type FormActionContext<A extends ActionAccess, S extends z.ZodType> = Who<A> & {
  headers: Headers;
  value: z.output<S>;
  formData: FormData;
  reply: Reply;
};

/** A conform form's action: every field error beside its field, refusals as form errors. */
export function formAction<A extends ActionAccess, S extends z.ZodType, R extends SubmissionResult<string[]>>(
  spec: ActionSpec<A, S>,
  handler: (ctx: FormActionContext<A, S>) => Promise<R>,
): (prev: unknown, formData: FormData) => Promise<R | SubmissionResult<string[]>> {
  return async (_prev, formData) => {
    const submission = parseWithZod(formData, { schema: spec.schema });
    const refuse = (thrown: unknown) => {
      const err = asRefusal(thrown);
      if (!(err instanceof HttpError)) throw err;
      if (err.issues?.length)
        return submission.reply({ fieldErrors: Object.fromEntries(err.issues.map((i) => [i.path, [i.message]])) });
      return submission.reply({ formErrors: [err.message] });
    };
    const h: Headers = await nextHeaders();
    try {
      const caller = await who(spec, h);
      if (submission.status !== "success") return submission.reply();
      const reply: Reply = (options) => submission.reply(options);
      // conform types the value with zod/v4/core's `output`, the same type as zod's `z.output`.
      const value = submission.value as z.output<S>;
      return await handler({ ...caller, headers: h, value, formData, reply });
    } catch (err) {
      return refuse(err);
    }
  };
}

/** What a small action's button shows: an error, or a confirmation. */
export type ActionState = { error?: string; ok?: string } | undefined;

/** A button's action with `useActionState`: refusals and invalid fields become `{ error }`. */
export function stateAction<A extends ActionAccess, S extends z.ZodType>(
  spec: ActionSpec<A, S>,
  handler: (ctx: ActionContext<A, S>) => Promise<ActionState>,
): (prev: ActionState, formData: FormData) => Promise<ActionState> {
  return async (_prev, formData) => {
    const h: Headers = await nextHeaders();
    try {
      const caller = await who(spec, h);
      const value = parseFields(spec.schema, formData);
      return await handler({ ...caller, headers: h, value, formData });
    } catch (thrown) {
      const err = asRefusal(thrown);
      if (!(err instanceof HttpError)) throw err;
      return { error: err.issues?.length ? err.issues.map((i) => i.message).join(" ") : err.message };
    }
  };
}

/** A `<form action>` without state; a refusal (HttpError) is handed to `refused`, which usually redirects. */
export function plainAction<A extends ActionAccess, S extends z.ZodType>(
  spec: ActionSpec<A, S> & { refused: (err: HttpError) => Promise<void> | void },
  handler: (ctx: ActionContext<A, S>) => Promise<void>,
): (formData?: FormData) => Promise<void> {
  return async (formData = new FormData()) => {
    const h: Headers = await nextHeaders();
    try {
      const caller = await who(spec, h);
      const value = parseFields(spec.schema, formData);
      await handler({ ...caller, headers: h, value, formData });
    } catch (thrown) {
      const err = asRefusal(thrown);
      if (!(err instanceof HttpError)) throw err;
      await spec.refused(err);
    }
  };
}
