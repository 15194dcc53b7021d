/**
 * Command line: `npm run --silent heterolane -- <command>`.
 *
 * `check FILE` reads a plan document (`heterolane.plan/1`) from a file or
 * stdin and writes the result document (`heterolane.result/1`) as JSON to
 * stdout: exit 0 for any valid document whatever its findings, 2 for invalid
 * input (one `path: message` line per error on stderr, also for unreadable
 * files and malformed JSON), 1 for an internal fault.
 *
 * The other commands work against a server with a personal API token
 * (src/cli/remote, docs/automation.md): login, missions, pull, push,
 * check --remote, report. Their exit statuses are in `EXIT_TEXT`.
 */
import { readFile } from "node:fs/promises";
import { resolve } from "node:path";
import { parseArgs } from "node:util";
import { runCheck, type CheckOutcome } from "./run-check";
import { CliError, EXIT_TEXT } from "./remote/errors";

const USAGE = `Usage: heterolane check <plan.json | ->
       heterolane check --remote MISSION [--table]
       heterolane login --url URL               (reads the token from stdin)
       heterolane missions [--table]
       heterolane pull MISSION [--revision N] [--table]
       heterolane push MISSION FILE [--base N | --force] [--table]
       heterolane report MISSION > report.html

check FILE     checks a plan document (format heterolane.plan/1) on this
               machine and writes the result document (heterolane.result/1:
               chains with feasibility map and place, channels, spurs,
               findings) as JSON to stdout. Use "-" to read stdin.
check --remote the stored result of the mission's latest revision.
login          checks the server address and API token (made on the account
               page) and keeps them in ~/.config/heterolane/config.json, mode
               600 (or $HETEROLANE_CONFIG). HETEROLANE_URL and HETEROLANE_TOKEN
               in the environment take the place of the file.
missions       the missions of the token's team.
pull           the plan document of the latest revision (or --revision N);
               the revision is remembered for push.
push           stores FILE as a new revision if the mission is still at the
               revision FILE was pulled at (or --base N); --force skips that.
report         the printable report of the latest revision as HTML.
MISSION is a mission id or its exact name. Output is JSON on stdout (--table
for a short table); errors go to stderr.

${EXIT_TEXT}
  (check FILE uses 0, 1 and 2 only.)

Options:
  -h, --help  show this text
`;

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(typeof chunk === "string" ? Buffer.from(chunk) : chunk);
  return Buffer.concat(chunks).toString("utf8");
}

function describeReadError(e: unknown): string {
  const code = (e as NodeJS.ErrnoException)?.code;
  if (code === "ENOENT") return "no such file";
  if (code === "EISDIR") return "is a directory, not a file";
  if (code === "EACCES" || code === "EPERM") return "permission denied";
  return e instanceof Error ? e.message : String(e);
}

type Outcome = { exitCode: number; stdout: string; stderr: string };

const OPTIONS = {
  table: { type: "boolean" },
  remote: { type: "boolean" },
  revision: { type: "string" },
  base: { type: "string" },
  force: { type: "boolean" },
  url: { type: "string" },
  help: { type: "boolean", short: "h" },
} as const;

function whole(name: string, value: string | undefined): number | undefined {
  if (value === undefined) return undefined;
  if (!/^[1-9]\d{0,8}$/.test(value))
    throw new CliError(2, `--${name} must be a revision number (1 or more), not "${value}".`);
  return Number(value);
}

async function main(argv: string[]): Promise<Outcome> {
  if (argv.length === 0 || argv.includes("--help") || argv.includes("-h") || argv[0] === "help") {
    return argv.length === 0 ? { exitCode: 2, stdout: "", stderr: USAGE } : { exitCode: 0, stdout: USAGE, stderr: "" };
  }
  const [command, ...rest] = argv;
  if (command === "check" && !rest.includes("--remote")) return checkLocal(rest);
  const remote = ["login", "missions", "pull", "push", "report", "check"];
  if (!remote.includes(command!)) {
    return { exitCode: 2, stdout: "", stderr: `unknown command "${command}"\n\n${USAGE}` };
  }
  let parsed;
  try {
    parsed = parseArgs({ args: rest, options: OPTIONS, allowPositionals: true, strict: true });
  } catch (e) {
    return { exitCode: 2, stdout: "", stderr: `${(e as Error).message}\n\n${USAGE}` };
  }
  const { values: o, positionals: p } = parsed;
  const wants = (n: number, what: string) => {
    if (p.length !== n) throw new CliError(2, `${command} takes ${what}.`);
  };
  const cmd = await import("./remote/commands");
  const io = {
    env: process.env,
    cwd: process.env.INIT_CWD ?? process.cwd(),
    readStdin,
  };
  try {
    let out: { stdout: string; stderr?: string };
    if (command === "login") {
      wants(0, "no arguments but --url URL");
      out = await cmd.login(io, o.url);
    } else if (command === "missions") {
      wants(0, "no arguments");
      out = await cmd.missions(io, !!o.table);
    } else if (command === "pull") {
      wants(1, "one mission (id or name)");
      out = await cmd.pull(io, p[0]!, whole("revision", o.revision), !!o.table);
    } else if (command === "push") {
      wants(2, "a mission (id or name) and a plan file (or - for stdin)");
      if (o.force && o.base !== undefined) throw new CliError(2, "push takes --base N or --force, not both.");
      out = await cmd.push(io, p[0]!, p[1]!, { base: whole("base", o.base), force: !!o.force, asTable: !!o.table });
    } else if (command === "report") {
      wants(1, "one mission (id or name)");
      out = await cmd.report(io, p[0]!);
    } else {
      wants(1, "one mission (id or name) with --remote");
      out = await cmd.checkRemote(io, p[0]!, !!o.table);
    }
    return { exitCode: 0, stdout: out.stdout, stderr: out.stderr ?? "" };
  } catch (e) {
    if (!(e instanceof CliError)) throw e;
    return { exitCode: e.exitCode, stdout: "", stderr: [e.message, ...e.details].join("\n") + "\n" };
  }
}

async function checkLocal(rest: string[]): Promise<CheckOutcome> {
  if (rest.length !== 1) {
    return { exitCode: 2, stdout: "", stderr: `check takes exactly one file name (or - for stdin)\n\n${USAGE}` };
  }
  const source = rest[0]!;
  let text: string;
  try {
    // `npm run` starts the script in the project folder; INIT_CWD is where
    // the person typed the command, so relative names are read from there.
    text =
      source === "-"
        ? await readStdin()
        : await readFile(resolve(process.env.INIT_CWD ?? process.cwd(), source), "utf8");
  } catch (e) {
    return {
      exitCode: 2,
      stdout: "",
      stderr: `(document): cannot read ${JSON.stringify(source)}: ${describeReadError(e)}\n`,
    };
  }
  // The engine is loaded only once there is a valid document to check.
  return runCheck(text, async (plan) => (await import("@/lib/plan")).checkPlan(plan));
}

main(process.argv.slice(2))
  .catch((e: unknown): Outcome => ({
    exitCode: 1,
    stdout: "",
    stderr: `internal error: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`,
  }))
  .then((outcome) => {
    if (outcome.stderr) process.stderr.write(outcome.stderr);
    process.exitCode = outcome.exitCode;
    if (outcome.stdout) {
      process.stdout.on("error", () => {}); // a closed pipe (e.g. `| head`) is not a fault
      process.stdout.write(outcome.stdout);
    }
  });
