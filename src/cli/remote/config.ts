import { chmod, mkdir, readFile, stat, writeFile } from "node:fs/promises";
import { homedir } from "node:os";
import { dirname, join } from "node:path";
import { CliError, EXIT } from "./errors";

/**
 * Where the command line finds its server and token: the environment
 * (`HETEROLANE_URL`, `HETEROLANE_TOKEN`) or the config file written by
 * `login` (`$HETEROLANE_CONFIG`, else `$XDG_CONFIG_HOME/heterolane/config.json`,
 * else `~/.config/heterolane/config.json`), mode 600. A config file that
 * others may read is refused. The revision each mission was last pulled at
 * is kept beside it in `pulled.json`, for `push`.
 */
export interface Settings {
  url: string;
  token: string;
}

type Env = Record<string, string | undefined>;

export function configPath(env: Env): string {
  if (env.HETEROLANE_CONFIG) return env.HETEROLANE_CONFIG;
  const base = env.XDG_CONFIG_HOME || join(env.HOME || homedir(), ".config");
  return join(base, "heterolane", "config.json");
}

const pulledPath = (env: Env) => join(dirname(configPath(env)), "pulled.json");

async function readPrivateJson(path: string): Promise<Record<string, unknown> | null> {
  let mode: number;
  try {
    mode = (await stat(path)).mode;
  } catch {
    return null;
  }
  if ((mode & 0o077) !== 0)
    throw new CliError(
      EXIT.auth,
      `${path} may be read by others (mode ${(mode & 0o777).toString(8)}); run "chmod 600 ${path}" or log in again.`,
    );
  try {
    const value: unknown = JSON.parse(await readFile(path, "utf8"));
    return value && typeof value === "object" ? (value as Record<string, unknown>) : null;
  } catch {
    throw new CliError(EXIT.auth, `${path} is not valid JSON; log in again with "heterolane login".`);
  }
}

async function writePrivateJson(path: string, value: unknown): Promise<void> {
  await mkdir(dirname(path), { recursive: true, mode: 0o700 });
  await writeFile(path, `${JSON.stringify(value, null, 2)}\n`, { mode: 0o600 });
  await chmod(path, 0o600); // an existing file keeps its old mode otherwise
}

/** The server and token to use; exit 4 when either is missing. */
export async function loadSettings(env: Env): Promise<Settings> {
  const file = env.HETEROLANE_URL && env.HETEROLANE_TOKEN ? null : await readPrivateJson(configPath(env));
  const url = env.HETEROLANE_URL || (typeof file?.url === "string" ? file.url : "");
  const token = env.HETEROLANE_TOKEN || (typeof file?.token === "string" ? file.token : "");
  if (!url || !token)
    throw new CliError(
      EXIT.auth,
      'Not logged in: run "heterolane login --url URL" (token on stdin), or set HETEROLANE_URL and HETEROLANE_TOKEN.',
    );
  return { url: url.replace(/\/+$/, ""), token };
}

export async function saveSettings(env: Env, settings: Settings): Promise<string> {
  const path = configPath(env);
  await writePrivateJson(path, settings);
  return path;
}

/** The revision `mission` was last pulled at on this machine, or null. */
export async function pulledRevision(env: Env, url: string, missionId: string): Promise<number | null> {
  const all = await readPrivateJson(pulledPath(env));
  const n = all?.[`${url} ${missionId}`];
  return typeof n === "number" ? n : null;
}

export async function rememberPulled(env: Env, url: string, missionId: string, revision: number): Promise<void> {
  const path = pulledPath(env);
  const all = (await readPrivateJson(path)) ?? {};
  all[`${url} ${missionId}`] = revision;
  await writePrivateJson(path, all);
}
