import { describe, expect, it } from "vitest";
import { assertJsonContentType, decodeUtf8Strict, readBodyBytes, readJsonBody } from "./body";
import { isDatabaseUnreachable } from "./unavailable";

/** A request whose body is produced chunk by chunk on demand; `pulled()` says how many chunks were asked for. */
function streamed(chunks: number, chunkBytes: number, headers: Record<string, string> = {}) {
  let pulls = 0;
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (pulls >= chunks) return controller.close();
      pulls++;
      controller.enqueue(new Uint8Array(chunkBytes).fill(0x61));
    },
  });
  const request = new Request("http://app.test/x", { method: "POST", body, headers, duplex: "half" } as RequestInit);
  return { request, pulled: () => pulls };
}

describe("readBodyBytes", () => {
  it("stops reading as soon as a streamed body passes the limit (no Content-Length)", async () => {
    const { request, pulled } = streamed(1000, 1024);
    await expect(readBodyBytes(request, 10 * 1024)).rejects.toMatchObject({ status: 413, code: "too-large" });
    // At most one chunk beyond the limit, and one the stream may queue ahead: never the 1 000 chunks.
    expect(pulled()).toBeLessThanOrEqual(13);
  });

  it("refuses a declared Content-Length above the limit without reading a byte", async () => {
    const { request, pulled } = streamed(1000, 1024, { "content-length": String(1000 * 1024) });
    await expect(readBodyBytes(request, 10 * 1024)).rejects.toMatchObject({ status: 413 });
    // A stream asks its source for one chunk on its own when made; the reader asks for none.
    expect(pulled()).toBeLessThanOrEqual(1);
  });

  it("returns a body within the limit whole", async () => {
    const { request } = streamed(3, 1000);
    expect((await readBodyBytes(request, 3000)).byteLength).toBe(3000);
  });
});

describe("JSON bodies", () => {
  // As over HTTP: a body comes with its length.
  const post = (body: string | Uint8Array<ArrayBuffer>, type = "application/json") =>
    new Request("http://app.test/x", {
      method: "POST",
      body,
      headers: {
        "content-type": type,
        "content-length": String(typeof body === "string" ? Buffer.byteLength(body) : body.byteLength),
      },
    });

  it("strict UTF-8: a Latin-1 byte is 400 invalid-encoding, a BOM is dropped", async () => {
    await expect(
      readJsonBody(post(new Uint8Array([0x7b, 0x22, 0x61, 0x22, 0x3a, 0x22, 0xe9, 0x22, 0x7d]))),
    ).rejects.toMatchObject({
      status: 400,
      code: "invalid-encoding",
    });
    expect(await readJsonBody(post('\uFEFF{"a":1}'))).toEqual({ a: 1 });
    expect(() => decodeUtf8Strict(new Uint8Array([0xc3, 0x28]))).toThrow(/UTF-8/);
  });

  it("a body that is not declared JSON is 415; JSON types with parameters and +json pass", async () => {
    await expect(readJsonBody(post("{}", "text/plain"))).rejects.toMatchObject({
      status: 415,
      code: "unsupported-media-type",
    });
    await expect(readJsonBody(post("a=1", "application/x-www-form-urlencoded"))).rejects.toMatchObject({ status: 415 });
    expect(await readJsonBody(post("{}", "application/json; charset=utf-8"))).toEqual({});
    expect(await readJsonBody(post("{}", "application/merge-patch+json"))).toEqual({});
    // No body at all: nothing to judge (the schema decides).
    expect(() => assertJsonContentType(new Request("http://app.test/x", { method: "POST" }))).not.toThrow();
  });

  it("malformed JSON is 400 invalid-json with the empty path", async () => {
    await expect(readJsonBody(post('{"a":'))).rejects.toMatchObject({
      status: 400,
      code: "invalid-json",
      issues: [{ path: "" }],
    });
  });
});

describe("isDatabaseUnreachable", () => {
  it.each([
    ["a refused connection", Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:5432"), { code: "ECONNREFUSED" })],
    ["a dropped connection", new Error("Connection terminated unexpectedly")],
    ["the pool's connect timeout", new Error("timeout exceeded when trying to connect")],
    [
      "admin shutdown (57P01)",
      Object.assign(new Error("terminating connection due to administrator command"), { code: "57P01" }),
    ],
    [
      "the server starting up (57P03)",
      Object.assign(new Error("the database system is starting up"), { code: "57P03" }),
    ],
    ["a connection exception (08006)", Object.assign(new Error("x"), { code: "08006" })],
    [
      "drizzle's wrapper around one",
      Object.assign(new Error("Failed query: select 1"), {
        cause: Object.assign(new Error("x"), { code: "ECONNREFUSED" }),
      }),
    ],
    [
      "an AggregateError of refusals",
      new AggregateError([Object.assign(new Error("x"), { code: "ECONNREFUSED" })], ""),
    ],
  ])("%s: yes", (_name, err) => {
    expect(isDatabaseUnreachable(err)).toBe(true);
  });

  it.each([
    ["a unique violation", Object.assign(new Error("dup"), { code: "23505" })],
    ["an invalid byte sequence", Object.assign(new Error("invalid byte sequence"), { code: "22021" })],
    ["a plain bug", new TypeError("x is undefined")],
    ["not an error", "oops"],
  ])("%s: no", (_name, err) => {
    expect(isDatabaseUnreachable(err)).toBe(false);
  });
});
