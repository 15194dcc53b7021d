/**
 * The one fetch wrapper of the client: JSON in, JSON out, and every non-2xx
 * answer turned into an `ApiError` carrying the server's `{ error: { code,
 * message, issues, current } }` body so forms can place field errors and
 * offer a reload on a 409.
 */

export interface ApiIssue {
  path: string;
  message: string;
}

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues: ApiIssue[] = [],
    readonly current: unknown = undefined,
  ) {
    super(message);
    this.name = "ApiError";
  }

  get isStale(): boolean {
    return this.status === 409;
  }
}

async function parseError(res: Response): Promise<ApiError> {
  let body: unknown = null;
  try {
    body = await res.json();
  } catch {
    body = null;
  }
  const err = (body as { error?: { code?: unknown; message?: unknown; issues?: unknown; current?: unknown } } | null)
    ?.error;
  const code = typeof err?.code === "string" ? err.code : `http-${res.status}`;
  const fallback: Record<number, string> = {
    401: "You are signed out. Sign in again to continue.",
    403: "Your role in this team does not allow this change.",
    404: "Not found (it may have been deleted).",
    409: "Someone else changed this in the meantime.",
    413: "The file is too large.",
  };
  const message =
    typeof err?.message === "string" ? err.message : (fallback[res.status] ?? `The server answered ${res.status}.`);
  const issues = Array.isArray(err?.issues)
    ? (err.issues as unknown[]).flatMap((i) => {
        const o = i as { path?: unknown; message?: unknown };
        return typeof o?.message === "string" ? [{ path: String(o.path ?? ""), message: o.message }] : [];
      })
    : [];
  return new ApiError(res.status, code, message, issues, err?.current);
}

export async function apiFetch<T>(url: string, init: RequestInit = {}): Promise<T> {
  const headers = new Headers(init.headers);
  if (init.body !== undefined && typeof init.body === "string" && !headers.has("content-type"))
    headers.set("content-type", "application/json");
  headers.set("accept", "application/json");
  let res: Response;
  try {
    res = await fetch(url, { ...init, headers, credentials: "same-origin" });
  } catch (e) {
    throw new ApiError(0, "network", `The server could not be reached (${(e as Error).message}).`);
  }
  if (!res.ok) throw await parseError(res);
  if (res.status === 204) return undefined as T;
  return (await res.json()) as T;
}

export const sendJson = <T>(url: string, method: "POST" | "PATCH" | "PUT", body: unknown) =>
  apiFetch<T>(url, { method, body: JSON.stringify(body) });

export const api = {
  missions: "/api/v1/missions",
  mission: (m: string) => `/api/v1/missions/${encodeURIComponent(m)}`,
  collection: (m: string, c: string) => `/api/v1/missions/${encodeURIComponent(m)}/${c}`,
  item: (m: string, c: string, id: string) =>
    `/api/v1/missions/${encodeURIComponent(m)}/${c}/${encodeURIComponent(id)}`,
};
