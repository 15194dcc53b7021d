import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { findingKey } from "./finding-key";
import { findingKeyText } from "./finding-key-text";

describe("findingKeyText", () => {
  it("names the chain, the channel and the rule in words, never the raw key", () => {
    const key = findingKey({ code: "nedt-unmet", chain: "K118", channel: "k118-w1" });
    const text = findingKeyText(key);
    expect(text).toBe("chain K118, channel k118-w1: The channel's NEΔT is above its requirement.");
    expect(text).not.toContain("|");
    expect(text).not.toContain("nedt-unmet");
  });

  it("leaves out the channel of a chain-level finding", () => {
    expect(findingKeyText("pd-overload|A|")).toBe(
      "chain A: The optical power per photodiode exceeds the detector's limit.",
    );
  });

  it("returns a text that is not a key unchanged", () => {
    expect(findingKeyText("no key here")).toBe("no key here");
  });

  it("never shows the separator for any key of ids without one", () => {
    const id = fc.stringMatching(/^[A-Za-z0-9_-]{1,12}$/);
    fc.assert(
      fc.property(id, fc.option(id, { nil: null }), (chain, channel) => {
        const text = findingKeyText(findingKey({ code: "slot-overlap", chain, channel }));
        expect(text).not.toContain("|");
        expect(text).toContain(`chain ${chain}`);
      }),
    );
  });
});
