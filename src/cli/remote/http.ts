import { CliError, EXIT, type ExitCode } from "./errors";
import type { Settings } from "./config";

/** The JSON error body of every Heterolane route: `{ error: { code, message, issues?, ... } }`. */
interface ErrorBody {
  error?: {
    code?: string;
    message?: string;
    issues?: { path: string; message: string }[];
    current?: { revision?: number };
    retryAfterSeconds?: number;
  };
}

const BY_STATUS: Record<number, ExitCode> = {
  400: EXIT.invalidInput,
  401: EXIT.auth,
  403: EXIT.forbidden,
  404: EXIT.notFound,
  409: EXIT.stale,
  413: EXIT.invalidInput,
  429: EXIT.rateLimited,
};

/**
 * HTTP calls to the server with the token in the Authorization header (never
 * in the URL). A refusal becomes a CliError with the server's message; the
 * token never appears in a message.
 */
export class Api {
  constructor(
    private readonly settings: Settings,
    private readonly fetchImpl: typeof fetch = fetch,
  ) {}

  get url(): string {
    return this.settings.url;
  }

  async request(method: string, path: string, body?: unknown): Promise<Response> {
    const headers: Record<string, string> = {
      authorization: `Bearer ${this.settings.token}`,
      accept: "application/json",
    };
    if (body !== undefined) headers["content-type"] = "application/json";
    let res: Response;
    try {
      res = await this.fetchImpl(`${this.settings.url}${path}`, {
        method,
        headers,
        body: body === undefined ? undefined : JSON.stringify(body),
        redirect: "manual",
      });
    } catch (e) {
      const cause = (e as { cause?: { code?: string } }).cause?.code ?? (e as Error).message;
      throw new CliError(EXIT.server, `Cannot reach ${this.settings.url}: ${cause}.`);
    }
    if (res.ok) return res;
    throw await refusal(res);
  }

  async json<T>(method: string, path: string, body?: unknown): Promise<T> {
    return (await (await this.request(method, path, body)).json()) as T;
  }
}

async function refusal(res: Response): Promise<CliError> {
  let body: ErrorBody = {};
  try {
    body = (await res.json()) as ErrorBody;
  } catch {
    body = {};
  }
  const e = body.error ?? {};
  // Anything else (a redirect, a 5xx, an unexpected status) is the server failing us.
  const code: ExitCode = BY_STATUS[res.status] ?? EXIT.server;
  const message = e.message ?? `The server answered ${res.status}.`;
  const details = (e.issues ?? []).map((i) => `${i.path === "" ? "(document)" : i.path}: ${i.message}`);
  const error = new CliError(code, `${message} (HTTP ${res.status}${e.code ? ` ${e.code}` : ""})`, details);
  return Object.assign(error, { body: e });
}
