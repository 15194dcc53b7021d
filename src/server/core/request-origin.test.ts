import { describe, expect, it } from "vitest";
import { crossSiteReason, isBearerOnly, needsOriginCheck, trustedOriginsFrom } from "./request-origin";

const TRUSTED = ["http://localhost:3000", "https://plans.example.org"];
const h = (init: Record<string, string>) => new Headers(init);

describe("crossSiteReason", () => {
  it.each([
    ["a trusted Origin", { origin: "http://localhost:3000" }, null],
    ["another trusted Origin", { origin: "https://plans.example.org" }, null],
    ["a foreign Origin", { origin: "http://evil.example" }, "it came from http://evil.example"],
    ["a trusted host on another port", { origin: "http://localhost:3001" }, "it came from http://localhost:3001"],
    ["Origin: null", { origin: "null" }, "it names no origin (Origin: null)"],
    ["no Origin, Sec-Fetch-Site same-origin", { "sec-fetch-site": "same-origin" }, null],
    ["no Origin, Sec-Fetch-Site none (typed address)", { "sec-fetch-site": "none" }, null],
    [
      "no Origin, Sec-Fetch-Site cross-site",
      { "sec-fetch-site": "cross-site" },
      "the browser marked it cross-site (Sec-Fetch-Site)",
    ],
    [
      "no Origin, Sec-Fetch-Site same-site",
      { "sec-fetch-site": "same-site" },
      "the browser marked it same-site (Sec-Fetch-Site)",
    ],
    ["neither header (not a browser page)", {}, null],
    // Origin decides when both are present.
    [
      "trusted Origin, cross-site fetch metadata",
      { origin: "http://localhost:3000", "sec-fetch-site": "cross-site" },
      null,
    ],
  ])("%s", (_name, headers, want) => {
    expect(crossSiteReason(h(headers), TRUSTED)).toBe(want);
  });
});

describe("needsOriginCheck: one condition", () => {
  it("checks state-changing methods, not reads", () => {
    for (const m of ["POST", "PUT", "PATCH", "DELETE", "post"])
      expect(needsOriginCheck(m, h({ cookie: "a=1" }))).toBe(true);
    for (const m of ["GET", "HEAD", "OPTIONS"]) expect(needsOriginCheck(m, h({ cookie: "a=1" }))).toBe(false);
  });

  it("skips requests authenticated by a bearer token alone, and only those", () => {
    expect(isBearerOnly(h({ authorization: "Bearer abc" }))).toBe(true);
    expect(needsOriginCheck("POST", h({ authorization: "Bearer abc" }))).toBe(false);
    // A cookie beside the token: the browser may have attached it, so the request is checked.
    expect(needsOriginCheck("POST", h({ authorization: "Bearer abc", cookie: "s=1" }))).toBe(true);
    expect(needsOriginCheck("POST", h({ authorization: "Basic abc" }))).toBe(true);
    expect(needsOriginCheck("POST", h({ authorization: "Bearer " }))).toBe(true);
    expect(needsOriginCheck("POST", h({}))).toBe(true);
  });
});

describe("trustedOriginsFrom", () => {
  it("is the public URL's origin plus the listed ones, without repeats", () => {
    expect(trustedOriginsFrom("http://localhost:3000/app", undefined)).toEqual(["http://localhost:3000"]);
    expect(
      trustedOriginsFrom("https://plans.example.org", " https://plans.example.org , http://10.0.0.5:3000"),
    ).toEqual(["https://plans.example.org", "http://10.0.0.5:3000"]);
  });
});
