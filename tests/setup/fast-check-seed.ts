/**
 * Property tests are repeatable: every fast-check run of the suite uses one
 * seed, `HETEROLANE_FC_SEED` from the environment (an integer; `random` picks
 * a fresh one), or the fixed default below. A failure prints the seed, the
 * shrunk counterexample and its path, so it can be replayed exactly; keep the
 * counterexample as a named regression example beside the property
 * (docs/testing.md, "Property tests").
 */
import fc from "fast-check";

const DEFAULT_SEED = 20261203;

function seedFromEnv(raw: string | undefined): number {
  if (raw === undefined || raw.trim() === "") return DEFAULT_SEED;
  if (raw.trim() === "random") return (Math.random() * 2 ** 31) | 0;
  const n = Number(raw);
  if (!Number.isSafeInteger(n))
    throw new Error(`HETEROLANE_FC_SEED must be an integer or "random", not ${JSON.stringify(raw)}`);
  return n | 0;
}

const seed = seedFromEnv(process.env.HETEROLANE_FC_SEED);

fc.configureGlobal({
  seed,
  reporter(details) {
    if (!details.failed) return;
    throw new Error(
      `${fc.defaultReportMessage(details) ?? "Property failed"}\n` +
        `Replay the whole suite with HETEROLANE_FC_SEED=${seed}; keep the counterexample as a named regression example.`,
    );
  },
});
