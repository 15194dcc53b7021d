/**
 * Lane view benchmark (`npm run bench:lanes`): opens the lab page with the
 * invented 64-channel plan in Chromium (Debian's /usr/bin/chromium through
 * playwright-core) against a running app (HETEROLANE_BENCH_URL, default
 * http://localhost:3000), drags one chain's LO for N frames
 * (HETEROLANE_BENCH_FRAMES, default 120) and prints the median and
 * 95th-percentile time per frame measured in the page: re-check + React
 * render and commit + style and layout ("work"), and the time to the next
 * animation frame ("frame"). Target: work ≤ 16 ms. Starts nothing but
 * Chromium.
 *
 * HETEROLANE_BENCH_STATIC=1 instead bundles the lab view with esbuild in
 * production mode (React without its development checks) and serves it from
 * a local static server on a free port: a stand-in for a production build
 * of the app when one cannot be made. The numbers then exclude Next.js.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { createServer, type Server } from "node:http";
import { chromium } from "playwright-core";

/** The lab view bundled in production mode and served on 127.0.0.1; returns its base URL and server. */
async function staticLab(): Promise<{ base: string; server: Server }> {
  const { build } = await import("esbuild");
  const out = await build({
    stdin: {
      contents: `import { createRoot } from "react-dom/client";
import { LabLaneView } from "./app/(dev)/lab/lane-view/_components/lab-lane-view";
const name = new URLSearchParams(location.search).get("plan") ?? "demo64";
createRoot(document.getElementById("root")!).render(<LabLaneView name={name} />);`,
      resolveDir: process.cwd(),
      loader: "tsx",
    },
    bundle: true,
    minify: true,
    format: "esm",
    jsx: "automatic",
    write: false,
    alias: { "@": "./src" },
    define: { "process.env.NODE_ENV": '"production"' },
    logLevel: "error",
  });
  const js = out.outputFiles[0]!.text;
  const html = `<!doctype html><html><head><meta charset="utf-8"><title>lane view (production bundle)</title></head><body style="font-family:sans-serif;margin:16px"><div id="root"></div><script type="module" src="/app.js"></script></body></html>`;
  const server = createServer((req, res) => {
    if (req.url?.startsWith("/app.js")) res.writeHead(200, { "content-type": "text/javascript" }).end(js);
    else res.writeHead(200, { "content-type": "text/html" }).end(html);
  });
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
  const addr = server.address();
  const port = typeof addr === "object" && addr ? addr.port : 0;
  return { base: `http://127.0.0.1:${port}`, server };
}

interface FrameTime {
  workMs: number;
  frameMs: number;
}

function quantile(sorted: number[], q: number): number {
  if (sorted.length === 0) return Number.NaN;
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1));
  return sorted[i]!;
}

async function main() {
  const stat = process.env.HETEROLANE_BENCH_STATIC === "1" ? await staticLab() : null;
  const base = stat?.base ?? (process.env.HETEROLANE_BENCH_URL ?? "http://localhost:3000").replace(/\/$/, "");
  const frames = Math.max(10, Number(process.env.HETEROLANE_BENCH_FRAMES ?? 120));
  const chain = process.env.HETEROLANE_BENCH_CHAIN ?? "wv183";
  const userDir = mkdtempSync(join(tmpdir(), "heterolane-bench-"));
  const context = await chromium.launchPersistentContext(userDir, {
    executablePath: "/usr/bin/chromium",
    headless: true,
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
    viewport: { width: 1400, height: 1000 },
  });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    // HETEROLANE_BENCH_PATH can point at another page that renders the lab view (e.g. a static production bundle).
    const pagePath = process.env.HETEROLANE_BENCH_PATH ?? (stat ? "/?plan=demo64" : "/lab/lane-view?plan=demo64");
    await page.goto(`${base}${pagePath}`, { waitUntil: "load", timeout: 180_000 });
    // Wait for hydration (the server-rendered chart is there before its handlers are).
    await page.locator('[data-testid="lane-view"][data-ready="1"]').waitFor({ timeout: 180_000 });
    const handle = page.locator(`[data-item="optical:${chain}:lo"]`);
    await handle.waitFor({ timeout: 180_000 });
    const box = await handle.boundingBox();
    if (!box) throw new Error("The LO handle is not visible.");
    const x0 = box.x + box.width / 2;
    const y0 = box.y + box.height - 6;
    await page.mouse.move(x0, y0);
    await page.mouse.down();
    // Warm-up: a few moves before measuring.
    for (let i = 0; i < 5; i++) await page.mouse.move(x0 + i * 2, y0);
    await page.evaluate(() => {
      window.__laneFrames = [];
    });
    for (let i = 0; i < frames; i++) {
      // Sweep ±40 px about the start (several GHz at the opening zoom), crossing feasible and blocked offsets.
      const dx = 40 * Math.sin((2 * Math.PI * i) / 60);
      await page.mouse.move(x0 + dx, y0);
      await page.evaluate(
        () => new Promise<void>((r) => requestAnimationFrame(() => requestAnimationFrame(() => r()))),
      );
    }
    await page.mouse.up();
    const times = (await page.evaluate(() => window.__laneFrames ?? [])) as FrameTime[];
    if (times.length === 0) throw new Error("No frame was measured: the drag did not move the LO.");
    const work = times.map((t) => t.workMs).sort((a, b) => a - b);
    const frame = times.map((t) => t.frameMs).sort((a, b) => a - b);
    const status = await page.locator(`[data-testid="lo-status-${chain}"]`).textContent();
    console.log(
      `lane view, 64-channel demo plan, chain ${chain}, ${stat ? "static production bundle" : base}: ${times.length} re-check frames measured of ${frames} moves`,
    );
    console.log(
      `  re-check + render (work): median ${quantile(work, 0.5).toFixed(2)} ms, p95 ${quantile(work, 0.95).toFixed(2)} ms, max ${work[work.length - 1]!.toFixed(2)} ms (target ≤ 16 ms)`,
    );
    console.log(
      `  to next animation frame:  median ${quantile(frame, 0.5).toFixed(2)} ms, p95 ${quantile(frame, 0.95).toFixed(2)} ms`,
    );
    console.log(`  LO status after the drag: ${status?.trim()}`);
  } finally {
    stat?.server.close();
    await context.close();
    rmSync(userDir, { recursive: true, force: true });
  }
}

declare global {
  interface Window {
    __laneFrames?: FrameTime[];
  }
}

main().catch((e: unknown) => {
  console.error(`bench:lanes failed: ${(e as Error).message}`);
  process.exit(1);
});
