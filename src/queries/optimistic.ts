import type { Channel } from "./types";

/** The channel list as it will look once the edit is saved (version not bumped: the server decides it). */
export function applyChannelEdit(list: readonly Channel[], id: string, input: Record<string, unknown>): Channel[] {
  return list.map((c) => {
    if (c.id !== id) return c;
    const { version: _v, ...rest } = input;
    return { ...c, ...(rest as Partial<Channel>) };
  });
}
