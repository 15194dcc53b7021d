import { explainCode } from "@/lib/lanes/explain-code";

/**
 * A finding key (`code|chain|channel`, see `findingKey`) in words, for the
 * places that show waivers and refusals to people: "chain K118, channel
 * k118-w1: The channel's NEΔT is above its requirement." A text that is not
 * a key is returned as it is.
 */
export function findingKeyText(key: string): string {
  const parts = key.split("|");
  if (parts.length !== 3 || !parts[0]) return key;
  const [code, chain, channel] = parts as [string, string, string];
  const where = [chain ? `chain ${chain}` : "", channel ? `channel ${channel}` : ""].filter(Boolean).join(", ");
  return `${where ? `${where}: ` : ""}${explainCode(code)}`;
}
