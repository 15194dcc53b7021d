/**
 * Exit statuses of the command line (printed by `--help`, listed in
 * docs/automation.md). `check FILE` keeps its own three (0, 1, 2).
 */
export const EXIT = {
  ok: 0,
  internal: 1,
  invalidInput: 2,
  stale: 3,
  auth: 4,
  forbidden: 5,
  notFound: 6,
  rateLimited: 7,
  server: 8,
} as const;
export type ExitCode = (typeof EXIT)[keyof typeof EXIT];

export const EXIT_TEXT = `Exit status:
  0  success (check: the document is valid, whatever its findings)
  1  internal fault
  2  invalid input: bad arguments, or an invalid plan document (one
     "path: message" line per problem on stderr)
  3  push refused: the mission has a newer revision than the one the file
     was pulled at; the server's current revision is named, nothing was
     overwritten
  4  not signed in: no server or token configured, or the token was refused
     (missing, malformed, expired or revoked)
  5  the token's role may not do this
  6  no such mission or revision (or one of another team)
  7  the token's rate limit was reached; try again later
  8  the server could not be reached, or failed`;

/** A failure with its exit status and a one-line message for stderr (never containing the token). */
export class CliError extends Error {
  constructor(
    readonly exitCode: ExitCode,
    message: string,
    /** Extra lines for stderr (e.g. one per invalid field). */
    readonly details: string[] = [],
  ) {
    super(message);
  }
}
