import { expect } from "vitest";
import { parseChannelCsv } from "./parse-channel-csv";

/** The two chains the channel CSV tests name by key (A and B). */
export const CHAINS = [
  { id: "11111111-1111-4111-8111-111111111111", key: "A" },
  { id: "22222222-2222-4222-8222-222222222222", key: "B" },
];

/** Reads the lines as a channel CSV against CHAINS, expects the file as a whole to be read, and returns its rows. */
export function readChannelLines(lines: string[]) {
  const r = parseChannelCsv(lines.join("\n"), CHAINS);
  expect(r.ok).toBe(true);
  if (!r.ok) throw new Error(`the file was refused: ${JSON.stringify(r.issues)}`);
  return r;
}
