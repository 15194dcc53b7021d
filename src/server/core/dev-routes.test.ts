import { describe, expect, it } from "vitest";
import { devRoutesEnabled } from "./dev-routes";

describe("devRoutesEnabled", () => {
  const cases: [Record<string, string | undefined>, boolean][] = [
    [{ NODE_ENV: "development" }, true],
    [{ NODE_ENV: "test" }, true],
    [{ NODE_ENV: "production" }, false],
    [{ NODE_ENV: "production", HETEROLANE_DEV_ROUTES: "1" }, true],
    [{ NODE_ENV: "production", HETEROLANE_DEV_ROUTES: "0" }, false],
    // The older name still works when the new one is unset …
    [{ NODE_ENV: "production", HETEROLANE_DEV_MAIL: "1" }, true],
    [{ NODE_ENV: "production", HETEROLANE_DEV_MAIL: "0" }, false],
    // … and the new name decides when both are set.
    [{ NODE_ENV: "production", HETEROLANE_DEV_ROUTES: "0", HETEROLANE_DEV_MAIL: "1" }, false],
    [{ NODE_ENV: "production", HETEROLANE_DEV_ROUTES: "1", HETEROLANE_DEV_MAIL: "0" }, true],
  ];
  it.each(cases)("%j → %s", (env, served) => {
    expect(devRoutesEnabled(env)).toBe(served);
  });
});
