/**
 * Helpers for the workspace integration tests: JSON calls as one person,
 * a mission filled from a plan document, and multipart uploads.
 */
import { jsonOrNull, type TestClient } from "./auth-helpers";

export interface Reply {
  status: number;
  body: any; // eslint-disable-line @typescript-eslint/no-explicit-any
  text: string;
  headers: Headers;
}

/** Reads a response: status, headers, text, and the body as JSON when it parses (null otherwise). */
async function readReply(res: Response): Promise<Reply> {
  const text = await res.text();
  return { status: res.status, body: jsonOrNull(text), text, headers: res.headers };
}

/** Sends a request (JSON body when given) and reads the answer as JSON when possible. */
export async function call(
  c: TestClient,
  method: string,
  path: string,
  json?: unknown,
  headers?: HeadersInit,
): Promise<Reply> {
  const res = await c.fetch(path, { method, ...(json !== undefined ? { json } : {}), headers });
  return readReply(res);
}

/** Sends raw text as the request body with a content type. */
export async function callRaw(
  c: TestClient,
  method: string,
  path: string,
  raw: string,
  contentType = "application/json",
): Promise<Reply> {
  const res = await c.fetch(path, { method, body: raw, headers: { "content-type": contentType } });
  return readReply(res);
}

/** Uploads bytes as the multipart field `file`. */
export async function upload(
  c: TestClient,
  path: string,
  content: string | Uint8Array,
  filename = "data.csv",
  type = "text/csv",
): Promise<Reply> {
  const form = new FormData();
  const bytes = typeof content === "string" ? new TextEncoder().encode(content) : content;
  form.set("file", new Blob([new Uint8Array(bytes)], { type }), filename);
  const res = await c.fetch(path, { method: "POST", body: form });
  return readReply(res);
}

/** Creates a mission as `c` and imports `plan` into it; returns the mission id. */
export async function missionWithPlan(
  c: TestClient,
  plan: unknown,
  name = `Test mission ${Math.random().toString(36).slice(2, 8)}`,
): Promise<string> {
  const created = await call(c, "POST", "/api/v1/missions", { name });
  if (created.status !== 201) throw new Error(`mission create answered ${created.status}: ${created.text}`);
  const id: string = created.body.id;
  if (plan !== undefined) {
    const imported = await call(c, "POST", `/api/v1/missions/${id}/plan`, plan);
    if (imported.status !== 201) throw new Error(`plan import answered ${imported.status}: ${imported.text}`);
  }
  return id;
}
