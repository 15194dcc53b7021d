/**
 * Reading a plan document from JSON text: the text without a leading byte
 * order mark, and for a syntax error a message with the line and column
 * where the text stops being JSON (Node's own message does not always give
 * a position, so the place is found by `jsonErrorOffset`, an RFC 8259
 * grammar walk).
 */

export type JsonTextRead = { ok: true; value: unknown } | { ok: false; message: string };

/** Parses JSON text (a leading BOM is ignored); a syntax error comes back as one message with its position. */
export function readJsonText(text: string): JsonTextRead {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  try {
    return { ok: true, value: JSON.parse(body) };
  } catch {
    return { ok: false, message: jsonSyntaxMessage(body) };
  }
}

function jsonSyntaxMessage(text: string): string {
  const pos = jsonErrorOffset(text);
  const before = text.slice(0, pos);
  const line = before.split("\n").length;
  const column = pos - before.lastIndexOf("\n");
  const reason = pos >= text.length ? "unexpected end of input" : `unexpected ${JSON.stringify(text[pos])}`;
  return `not valid JSON: ${reason} at line ${line}, column ${column}`;
}

/**
 * Offset of the first character at which `text` stops being JSON (RFC 8259
 * grammar); `text.length` when the input ends early. Only called after
 * `JSON.parse` failed, because Node's message does not always give a position.
 */
export function jsonErrorOffset(text: string): number {
  let i = 0;
  const n = text.length;
  const ws = () => {
    while (i < n && (text[i] === " " || text[i] === "\t" || text[i] === "\n" || text[i] === "\r")) i++;
  };
  class Stop {
    constructor(readonly at: number) {}
  }
  const fail = (): never => {
    throw new Stop(i);
  };
  const expect = (word: string) => {
    for (const ch of word) {
      if (text[i] !== ch) fail();
      i++;
    }
  };
  const digits = () => {
    const start = i;
    while (i < n && text[i]! >= "0" && text[i]! <= "9") i++;
    if (i === start) fail();
  };
  const number = () => {
    if (text[i] === "-") i++;
    if (text[i] === "0") i++;
    else digits();
    if (text[i] === ".") {
      i++;
      digits();
    }
    if (text[i] === "e" || text[i] === "E") {
      i++;
      if (text[i] === "+" || text[i] === "-") i++;
      digits();
    }
  };
  const string = () => {
    expect('"');
    for (;;) {
      if (i >= n) fail();
      const c = text.charCodeAt(i);
      if (c === 0x22) {
        i++;
        return;
      }
      if (c < 0x20) fail();
      if (c === 0x5c) {
        i++;
        const esc = text[i];
        if (esc === "u") {
          i++;
          for (let k = 0; k < 4; k++) {
            if (!/[0-9a-fA-F]/.test(text[i] ?? "")) fail();
            i++;
          }
        } else if (esc !== undefined && '"\\/bfnrt'.includes(esc)) i++;
        else fail();
      } else i++;
    }
  };
  // Iterative over nesting so deep documents cannot overflow the stack.
  const stack: ("{" | "[")[] = [];
  const value = () => {
    ws();
    const c = text[i];
    if (c === "{" || c === "[") {
      stack.push(c);
      i++;
      ws();
      if (text[i] === (c === "{" ? "}" : "]")) {
        i++;
        stack.pop();
        return false;
      }
      if (c === "{") {
        string();
        ws();
        expect(":");
      }
      return true; // a container was opened: its first value comes next
    }
    if (c === '"') string();
    else if (c === "t") expect("true");
    else if (c === "f") expect("false");
    else if (c === "n") expect("null");
    else if (c === "-" || (c !== undefined && c >= "0" && c <= "9")) number();
    else fail();
    return false;
  };
  try {
    for (;;) {
      if (value()) continue;
      // After a complete value: close containers or move to the next member.
      for (;;) {
        ws();
        const top = stack[stack.length - 1];
        if (top === undefined) {
          if (i < n) fail();
          return n;
        }
        if (text[i] === ",") {
          i++;
          if (top === "{") {
            ws();
            string();
            ws();
            expect(":");
          }
          break;
        }
        expect(top === "{" ? "}" : "]");
        stack.pop();
      }
    }
  } catch (e) {
    if (e instanceof Stop) return Math.min(e.at, n);
    throw e;
  }
}
