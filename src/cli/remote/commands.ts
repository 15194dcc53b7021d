import { readFile } from "node:fs/promises";
import { resolve } from "node:path";
import { parsePlanText } from "@/schemas/plan";
import { issueLines } from "../run-check";
import { loadSettings, pulledRevision, rememberPulled, saveSettings, type Settings } from "./config";
import { CliError, EXIT } from "./errors";
import { Api } from "./http";
import { reportHtml, type ReportData } from "./report-html";
import { table } from "./table";

/**
 * The commands that work against a server: login, missions, pull, push,
 * check --remote, report. Each returns what to print; errors are thrown as
 * CliError (exit status and message). docs/automation.md describes them.
 */

export interface Io {
  env: Record<string, string | undefined>;
  /** The folder relative file names are read from. */
  cwd: string;
  readStdin: () => Promise<string>;
  fetch?: typeof fetch;
}

export interface Output {
  stdout: string;
  stderr?: string;
}

interface MissionRow {
  id: string;
  name: string;
  status: string;
  chainCount: number;
  channelCount: number;
  openErrors: number;
  openWarnings: number;
  updatedAt: string;
  version: number;
}

interface RevisionRow {
  number: number;
  status: string;
  authorName: string;
  createdAt: string;
  summary: string;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const json = (value: unknown) => `${JSON.stringify(value, null, 2)}\n`;

async function api(io: Io): Promise<Api> {
  return new Api(await loadSettings(io.env), io.fetch);
}

/** A mission by id, or by its exact name (case ignored) among the token's team's missions. */
async function missionId(a: Api, ref: string): Promise<string> {
  if (UUID.test(ref)) return ref;
  const { missions } = await a.json<{ missions: MissionRow[] }>("GET", "/api/v1/missions");
  const hits = missions.filter((m) => m.name.toLowerCase() === ref.toLowerCase());
  if (hits.length === 1) return hits[0]!.id;
  if (hits.length === 0) throw new CliError(EXIT.notFound, `No mission named "${ref}" in the token's team.`);
  throw new CliError(
    EXIT.invalidInput,
    `${hits.length} missions are named "${ref}"; use an id: ${hits.map((m) => m.id).join(", ")}.`,
  );
}

async function latestRevision(a: Api, id: string): Promise<number> {
  const { revisions } = await a.json<{ revisions: RevisionRow[] }>("GET", `/api/v1/missions/${id}/revisions`);
  const latest = Math.max(0, ...revisions.map((r) => r.number));
  if (latest === 0) throw new CliError(EXIT.notFound, "This mission has no revision yet.");
  return latest;
}

export async function login(io: Io, url: string | undefined): Promise<Output> {
  const server = (url ?? io.env.HETEROLANE_URL ?? "").replace(/\/+$/, "");
  if (!/^https?:\/\/[^/]+/.test(server))
    throw new CliError(
      EXIT.invalidInput,
      "login needs --url with the server's address, e.g. --url http://localhost:3000",
    );
  const token = (io.env.HETEROLANE_TOKEN ?? (await io.readStdin())).trim();
  if (!token)
    throw new CliError(
      EXIT.invalidInput,
      "login reads the token from stdin (or HETEROLANE_TOKEN); make one on the account page.",
    );
  const settings: Settings = { url: server, token };
  const { missions } = await new Api(settings, io.fetch).json<{ missions: MissionRow[] }>("GET", "/api/v1/missions");
  const path = await saveSettings(io.env, settings);
  return { stdout: json({ server, config: path, missions: missions.length }) };
}

export async function missions(io: Io, asTable: boolean): Promise<Output> {
  const list = await (await api(io)).json<{ missions: MissionRow[] }>("GET", "/api/v1/missions");
  if (!asTable) return { stdout: json(list) };
  return {
    stdout: table(
      ["id", "name", "status", "channels", "errors", "warnings", "updated"],
      list.missions.map((m) => [
        m.id,
        m.name,
        m.status,
        m.channelCount,
        m.openErrors,
        m.openWarnings,
        m.updatedAt.slice(0, 16).replace("T", " "),
      ]),
    ),
  };
}

interface PlanDoc {
  name: string;
  channels: { id: string; name: string; chain: string; centerGHz: number; bandwidthMHz: number }[];
}

/** The plan document of a revision (the latest without --revision); remembered for `push`. */
export async function pull(io: Io, ref: string, revision: number | undefined, asTable: boolean): Promise<Output> {
  const a = await api(io);
  const id = await missionId(a, ref);
  const n = revision ?? (await latestRevision(a, id));
  const rev = await a.json<{ number: number; plan: PlanDoc }>("GET", `/api/v1/missions/${id}/revisions/${n}`);
  await rememberPulled(io.env, a.url, id, rev.number);
  const note = `pulled revision ${rev.number} of mission ${id}\n`;
  if (!asTable) return { stdout: json(rev.plan), stderr: note };
  return {
    stdout: table(
      ["channel", "name", "chain", "centre GHz", "bandwidth MHz"],
      rev.plan.channels.map((c) => [c.id, c.name, c.chain, c.centerGHz, c.bandwidthMHz]),
    ),
    stderr: note,
  };
}

/**
 * Stores FILE as a new revision, only if the mission's latest revision is
 * still the one FILE was pulled at (`--base N`, else the last pull on this
 * machine); `--force` skips that check. A stale base is exit 3 and nothing
 * is saved (the server checks it inside the saving transaction).
 */
export async function push(
  io: Io,
  ref: string,
  file: string,
  opts: { base?: number; force: boolean; asTable: boolean },
): Promise<Output> {
  let text: string;
  try {
    text = file === "-" ? await io.readStdin() : await readFile(resolve(io.cwd, file), "utf8");
  } catch (e) {
    throw new CliError(EXIT.invalidInput, `(document): cannot read ${JSON.stringify(file)}: ${(e as Error).message}`);
  }
  const parsed = parsePlanText(text);
  if (!parsed.ok)
    throw new CliError(
      EXIT.invalidInput,
      `${file} is not a valid plan document; nothing was pushed.`,
      issueLines(parsed.issues).trimEnd().split("\n"),
    );
  const a = await api(io);
  const id = await missionId(a, ref);
  const base = opts.force ? undefined : (opts.base ?? (await pulledRevision(io.env, a.url, id)));
  if (!opts.force && base === null)
    throw new CliError(
      EXIT.invalidInput,
      `Not known which revision ${file} was pulled at: pull the mission first, or pass --base N (or --force to overwrite whatever is there).`,
    );
  const query = base === undefined ? "" : `?baseRevision=${base}`;
  let answer: { revision: { number: number; errorCount: number; warningCount: number; infoCount: number } };
  try {
    answer = await a.json("POST", `/api/v1/missions/${id}/plan${query}`, JSON.parse(text));
  } catch (e) {
    if (e instanceof CliError && e.exitCode === EXIT.stale) {
      const current = (e as CliError & { body?: { current?: { revision?: number } } }).body?.current?.revision;
      throw new CliError(
        EXIT.stale,
        `Mission ${id} is at revision ${current ?? "?"}, not ${base}: someone saved since ${file} was pulled. Nothing was overwritten; pull revision ${current ?? "the latest"}, apply your change again and push.`,
      );
    }
    throw e;
  }
  await rememberPulled(io.env, a.url, id, answer.revision.number);
  if (!opts.asTable) return { stdout: json({ mission: id, ...answer }) };
  const r = answer.revision;
  return {
    stdout: table(
      ["mission", "revision", "errors", "warnings", "info"],
      [[id, r.number, r.errorCount, r.warningCount, r.infoCount]],
    ),
  };
}

interface ResultDoc {
  findings: { severity: string; code: string; chain: string | null; channel: string | null; message: string }[];
}

/** The stored result of the mission's latest revision (the server checked it when it was saved). */
export async function checkRemote(io: Io, ref: string, asTable: boolean): Promise<Output> {
  const a = await api(io);
  const id = await missionId(a, ref);
  const result = await a.json<ResultDoc>("GET", `/api/v1/missions/${id}/result`);
  if (!asTable) return { stdout: json(result) };
  return {
    stdout: table(
      ["severity", "code", "chain", "channel", "message"],
      result.findings.map((f) => [f.severity, f.code, f.chain, f.channel, f.message]),
    ),
  };
}

/** The printable report of the latest revision as one self-contained HTML page. */
export async function report(io: Io, ref: string): Promise<Output> {
  const a = await api(io);
  const id = await missionId(a, ref);
  const n = await latestRevision(a, id);
  const [mission, revision] = await Promise.all([
    a.json<ReportData["mission"]>("GET", `/api/v1/missions/${id}`),
    a.json<ReportData["revision"]>("GET", `/api/v1/missions/${id}/revisions/${n}`),
  ]);
  return { stdout: reportHtml({ mission, revision, printedAt: new Date() }) };
}
