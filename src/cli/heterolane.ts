/**
 * Command line: `npm run --silent heterolane -- check <file.json|->`.
 *
 * Reads a plan document (`heterolane.plan/1` or `heterolane.plan/2`) from a
 * file or stdin and writes the result document (`heterolane.result/2`, with
 * each channel's figures over the operating envelope and each chain's
 * temperature window) as JSON to stdout.
 * Exit status: 0 for any valid document whatever its findings, 2 for invalid
 * input (one `path: message` line per error on stderr, also for unreadable
 * files and malformed JSON), 1 for an internal fault.
 */
import { readFile } from "node:fs/promises";
import { resolve } from "node:path";
import { runCheck, type CheckOutcome } from "./run-check";

const USAGE = `Usage: heterolane check <plan.json | ->

Checks a plan document (format heterolane.plan/1 or heterolane.plan/2) and
writes the result document (heterolane.result/2: chains with feasibility
map, place and temperature window; channels with their nominal figures and
their worst figures over the operating envelope; spurs; findings) as JSON
to stdout. Use "-" to read stdin.

Exit status:
  0  the document is valid (whatever its findings)
  2  invalid input: one "path: message" line per error on stderr
  1  internal fault

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

async function main(argv: string[]): Promise<CheckOutcome> {
  if (argv.length === 0 || argv.includes("--help") || argv.includes("-h") || argv[0] === "help") {
    return argv.length === 0 ? { exitCode: 2, stdout: "", stderr: USAGE } : { exitCode: 0, stdout: USAGE, stderr: "" };
  }
  const [command, ...rest] = argv;
  if (command !== "check") {
    return { exitCode: 2, stdout: "", stderr: `unknown command "${command}"\n\n${USAGE}` };
  }
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
  .catch((e: unknown): CheckOutcome => ({
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
