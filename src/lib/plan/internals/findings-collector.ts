import type { Finding, FindingCode, JsonValue, Severity } from "../types";
import { RULE_SEVERITY, ruleRank } from "../types";

/**
 * Make freshly built finding data JSON-safe in place: −0 becomes 0 and
 * non-finite numbers (only reachable with absurd inputs) become null.
 */
function jsonSafeInPlace(v: { [k: string]: JsonValue } | JsonValue[]): void {
  const fix = (x: JsonValue): JsonValue => {
    if (typeof x === "number") return Number.isFinite(x) ? (x === 0 ? 0 : x) : null;
    if (x !== null && typeof x === "object") jsonSafeInPlace(x);
    return x;
  };
  if (Array.isArray(v)) {
    for (let i = 0; i < v.length; i++) v[i] = fix(v[i] as JsonValue);
  } else {
    for (const k in v) v[k] = fix(v[k] as JsonValue);
  }
}

const byRule = (a: Finding, b: Finding) => ruleRank(a.code) - ruleRank(b.code);

/**
 * The one place the rule families of `evaluateChain` hand their findings
 * to. It owns what every finding shares: the chain and channel ids, the
 * default severity of each code (`RULE_SEVERITY`), JSON-safe data, and the
 * order of docs/plan-format.md §4.3 "Order of findings": chain-level
 * findings first, then per channel in input order, codes in rules-table order, stable
 * within a code (so a family adds the findings of one code in the order
 * they are to be listed; the order of the families does not matter).
 */
export class FindingsCollector {
  readonly #chainId: string;
  readonly #channelIds: readonly string[];
  readonly #chain: Finding[] = [];
  readonly #perChannel: Finding[][];

  /** `channelIds[i]` is the id of the chain's channel `i` (the index the families pass). */
  constructor(chainId: string, channelIds: readonly string[]) {
    this.#chainId = chainId;
    this.#channelIds = channelIds;
    this.#perChannel = channelIds.map(() => []);
  }

  /**
   * Add one finding: for the chain (`channelIndex` null) or for the chain's
   * channel `channelIndex`. `data` is made JSON-safe in place.
   */
  add(
    code: FindingCode,
    channelIndex: number | null,
    message: string,
    data: { [k: string]: JsonValue },
    severity: Severity = RULE_SEVERITY[code],
  ): void {
    const f: Finding = {
      code,
      severity,
      chain: this.#chainId,
      channel: channelIndex === null ? null : (this.#channelIds[channelIndex] as string),
      message,
      data,
    };
    jsonSafeInPlace(data);
    if (channelIndex === null) this.#chain.push(f);
    else (this.#perChannel[channelIndex] as Finding[]).push(f);
  }

  /** Every finding added so far, in the order of §4.3 (sorts the collected lists in place). */
  ordered(): Finding[] {
    const findings = [...this.#chain.sort(byRule)];
    for (const list of this.#perChannel) findings.push(...list.sort(byRule));
    return findings;
  }
}
