import { findingKeyOf } from "./internals/finding-key";
import type { FindingLike } from "./types";

/** The error findings (in order) that no waiver covers; warnings and infos never block a baseline. */
export function unwaivedErrors<F extends FindingLike>(findings: readonly F[], waivedKeys: readonly string[]): F[] {
  const waived = new Set(waivedKeys);
  return findings.filter((f) => f.severity === "error" && !waived.has(findingKeyOf(f)));
}
