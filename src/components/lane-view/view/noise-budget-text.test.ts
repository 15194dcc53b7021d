import { describe, expect, it } from "vitest";
import { NOISE_TERMS, type NoiseTermEntry } from "@/lib/plan";
import { dominantText, sortedTerms } from "./noise-budget-panel";
import { NOISE_TERM_TEXT } from "./noise-terms";

const terms: NoiseTermEntry[] = [
  { term: "front-end-loss", kelvin: 0 },
  { term: "quantum-limit", kelvin: 8.8 },
  { term: "conversion-loss", kelvin: 100 },
  { term: "carrier-shot-noise", kelvin: 300 },
];

describe("noise budget words", () => {
  it("lists the terms with kelvin, largest first", () => {
    expect(sortedTerms(terms).map((t) => t.term)).toEqual(["carrier-shot-noise", "conversion-loss", "quantum-limit"]);
  });
  it("names the dominant term, its share and what reduces it", () => {
    const text = dominantText(terms, 408.8);
    expect(text).toMatch(/^Residual-carrier shot noise dominates \(300\.0 K, 73 % of 408\.8 K\): /);
    expect(text).toContain("carrier notch");
  });
  it("has a name, colour and explanation for every term", () => {
    for (const t of NOISE_TERMS) expect(NOISE_TERM_TEXT[t].why.length).toBeGreaterThan(20);
  });
});
