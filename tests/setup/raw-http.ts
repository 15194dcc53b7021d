/**
 * Requests that fetch() cannot make: a chunked body of a chosen size sent
 * piece by piece (without Content-Length), and requests from a chosen
 * loopback address (127.0.0.0/8 all reach this machine, so each test can be
 * a client of its own for per-address limits).
 */
import { request } from "node:http";

export interface RawReply {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  text: string;
  /** Bytes of the body the client managed to send before the server answered or closed. */
  sent: number;
}

/**
 * POSTs `totalBytes` in chunks of `chunkBytes` with chunked transfer
 * encoding, all of it even when the server answers early (as a client that
 * does not read the answer would), unless the server closes the
 * connection. Resolves with the answer once the body is sent or the
 * connection is gone; `sent` says how much of the body went out.
 */
export function postChunked(
  url: string,
  opts: { totalBytes: number; chunkBytes?: number; headers?: Record<string, string>; fill?: number },
): Promise<RawReply> {
  const chunk = Buffer.alloc(opts.chunkBytes ?? 1024 * 1024, opts.fill ?? 0x61);
  return new Promise((resolve, reject) => {
    let sent = 0;
    let reply: Omit<RawReply, "sent"> | null = null;
    let bodyDone = false;
    let closed = false;
    const finish = () => {
      if (reply && (bodyDone || closed)) resolve({ ...reply, sent });
    };
    const req = request(
      url,
      { method: "POST", headers: { ...opts.headers, "transfer-encoding": "chunked" } },
      (res) => {
        let text = "";
        res.setEncoding("utf8");
        res.on("data", (d: string) => (text += d));
        res.on("end", () => {
          reply = { status: res.statusCode ?? 0, headers: res.headers, text };
          finish();
        });
      },
    );
    req.on("error", (err) => {
      closed = true;
      if (reply) finish();
      else reject(err);
    });
    req.on("close", () => {
      closed = true;
      finish();
    });
    const pump = () => {
      while (!closed && sent < opts.totalBytes) {
        const piece = sent + chunk.length <= opts.totalBytes ? chunk : chunk.subarray(0, opts.totalBytes - sent);
        sent += piece.length;
        if (!req.write(piece)) return void req.once("drain", pump);
      }
      if (!closed) req.end(() => ((bodyDone = true), finish()));
    };
    pump();
  });
}

/** One request from `localAddress` (a loopback address such as 127.0.0.23). */
export function requestFrom(
  localAddress: string,
  url: string,
  init: { method?: string; headers?: Record<string, string>; body?: string } = {},
): Promise<RawReply> {
  return new Promise((resolve, reject) => {
    const req = request(url, { method: init.method ?? "GET", headers: init.headers, localAddress }, (res) => {
      let text = "";
      res.setEncoding("utf8");
      res.on("data", (d: string) => (text += d));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, text, sent: 0 }));
    });
    req.on("error", reject);
    req.end(init.body);
  });
}
