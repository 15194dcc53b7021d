/**
 * Decodes an uploaded file as UTF-8, refusing anything that is not valid
 * UTF-8 (a spreadsheet saved as UTF-16 or Latin-1, or a binary file), and
 * refusing NUL characters, which no CSV text holds.
 */
export function decodeUtf8(bytes: Uint8Array): { ok: true; text: string } | { ok: false; message: string } {
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return { ok: false, message: "the file is not UTF-8 text (save it as CSV UTF-8)" };
  }
  if (text.includes("\u0000")) return { ok: false, message: "the file holds NUL characters: it is not CSV text" };
  return { ok: true, text };
}
