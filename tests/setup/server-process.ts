/**
 * The app server process as the operating system sees it, for tests that
 * measure it from outside (the memory test): the process listening on a
 * port (found through /proc/net/tcp and the processes' socket descriptors,
 * so it works however the server was started), its resident set and its
 * peak, which Linux lets the owner reset (`/proc/PID/clear_refs`, value 5:
 * "reset the peak resident set size", Linux proc(5)).
 */
import { readFileSync, readdirSync, readlinkSync, writeFileSync } from "node:fs";

/** The pid of the process listening on TCP `port` on this machine, or null (not Linux, not ours). */
export function pidListeningOn(port: number): number | null {
  const hex = `:${port.toString(16).toUpperCase().padStart(4, "0")}`;
  const inodes = new Set<string>();
  for (const file of ["/proc/net/tcp", "/proc/net/tcp6"]) {
    let text = "";
    try {
      text = readFileSync(file, "utf8");
    } catch {
      continue;
    }
    for (const line of text.split("\n").slice(1)) {
      const cols = line.trim().split(/\s+/);
      // local_address is column 1, state 0A is LISTEN, the inode is column 9.
      if (cols.length > 9 && cols[1]!.endsWith(hex) && cols[3] === "0A") inodes.add(cols[9]!);
    }
  }
  if (inodes.size === 0) return null;
  for (const pid of readdirSync("/proc").filter((d) => /^\d+$/.test(d))) {
    let fds: string[];
    try {
      fds = readdirSync(`/proc/${pid}/fd`);
    } catch {
      continue;
    }
    for (const fd of fds) {
      try {
        const m = readlinkSync(`/proc/${pid}/fd/${fd}`).match(/^socket:\[(\d+)\]$/);
        if (m && inodes.has(m[1]!)) return Number(pid);
      } catch {
        // the descriptor closed meanwhile
      }
    }
  }
  return null;
}

function statusKb(pid: number, field: "VmRSS" | "VmHWM"): number {
  const m = readFileSync(`/proc/${pid}/status`, "utf8").match(new RegExp(`^${field}:\\s+(\\d+) kB`, "m"));
  if (!m) throw new Error(`no ${field} in /proc/${pid}/status`);
  return Number(m[1]);
}

/** Resident set size in bytes. */
export const rssBytes = (pid: number) => statusKb(pid, "VmRSS") * 1024;
/** Peak resident set size in bytes since the start or the last reset. */
export const peakRssBytes = (pid: number) => statusKb(pid, "VmHWM") * 1024;

/** Resets the peak to the current resident set; false when not permitted (then sample instead). */
export function resetPeakRss(pid: number): boolean {
  try {
    writeFileSync(`/proc/${pid}/clear_refs`, "5");
    return true;
  } catch {
    return false;
  }
}
