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
 * POSTs up to `totalBytes` in chunks of `chunkBytes` with chunked transfer
 * encoding, as fast as the server takes them, until the server answers:
 * then it stops sending and closes the connection (a server that refuses a
 * body early does not read the rest, so TCP flow control would hold the
 * client anyway). `sent` says how much of the body went out.
 */
export function postChunked(
  url: string,
  opts: { totalBytes: number; chunkBytes?: number; headers?: Record<string, string>; fill?: number },
): Promise<RawReply> {
  const chunk = Buffer.alloc(opts.chunkBytes ?? 1024 * 1024, opts.fill ?? 0x61);
  return new Promise((resolve, reject) => {
    let sent = 0;
    let answered = false;
    const req = request(
      url,
      { method: "POST", headers: { ...opts.headers, "transfer-encoding": "chunked" } },
      (res) => {
        answered = true;
        let text = "";
        res.setEncoding("utf8");
        res.on("data", (d: string) => (text += d));
        res.on("end", () => {
          req.destroy();
          resolve({ status: res.statusCode ?? 0, headers: res.headers, text, sent });
        });
      },
    );
    req.on("error", (err) => {
      if (!answered) reject(err);
    });
    const pump = () => {
      while (!answered && sent < opts.totalBytes) {
        const piece = sent + chunk.length <= opts.totalBytes ? chunk : chunk.subarray(0, opts.totalBytes - sent);
        sent += piece.length;
        if (!req.write(piece)) return void req.once("drain", pump);
      }
      if (!answered) req.end();
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
