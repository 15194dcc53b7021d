import { afterEach, describe, expect, it, vi } from "vitest";
import { ApiError, apiFetch } from "./api";

function answer(status: number, body: unknown) {
  vi.stubGlobal(
    "fetch",
    vi.fn(async () => new Response(body === undefined ? null : JSON.stringify(body), { status })),
  );
}

afterEach(() => vi.unstubAllGlobals());

describe("apiFetch", () => {
  it("returns the JSON body of a 2xx answer", async () => {
    answer(200, { channels: [] });
    await expect(apiFetch("/x")).resolves.toEqual({ channels: [] });
  });

  it("carries code, message, issues and the current row of a 409", async () => {
    answer(409, {
      error: { code: "stale-version", message: "Changed by someone else.", current: { id: "c", version: 4 } },
    });
    const err = await apiFetch("/x").catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiError);
    const e = err as ApiError;
    expect([e.status, e.code, e.message, e.isStale]).toEqual([409, "stale-version", "Changed by someone else.", true]);
    expect(e.current).toEqual({ id: "c", version: 4 });
  });

  it("keeps every issue of a 400 with its path", async () => {
    answer(400, {
      error: {
        code: "invalid-input",
        message: "2 fields refused",
        issues: [
          { path: "centerGHz", message: "must be greater than 0" },
          { path: "bandwidthMHz", message: "is required" },
          { nonsense: true },
        ],
      },
    });
    const e = (await apiFetch("/x").catch((x: unknown) => x)) as ApiError;
    expect(e.issues).toEqual([
      { path: "centerGHz", message: "must be greater than 0" },
      { path: "bandwidthMHz", message: "is required" },
    ]);
  });

  it("gives a plain message when the body is not the agreed error shape", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => new Response("<html>", { status: 403 })),
    );
    const e = (await apiFetch("/x").catch((x: unknown) => x)) as ApiError;
    expect(e.status).toBe(403);
    expect(e.message).toMatch(/role/);
  });

  it("turns a failed connection into a status-0 error instead of throwing a TypeError", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => Promise.reject(new TypeError("fetch failed"))),
    );
    const e = (await apiFetch("/x").catch((x: unknown) => x)) as ApiError;
    expect([e.status, e.code]).toEqual([0, "network"]);
  });
});
